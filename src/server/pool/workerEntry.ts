/**
 * The module an answer worker runs: the TypeScript source here (started through tsx); the CLI build
 * (tools/buildCli.ts) replaces this module by one naming its own compiled worker, dist/answerWorker.js.
 */
export const WORKER_ENTRY: URL = new URL('./answerWorker.ts', import.meta.url);
