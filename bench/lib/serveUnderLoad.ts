/**
 * `kindred serve` started as its own process (as a user would start it, `--port 0`), warmed with one
 * request, then loaded by autocannon cycling over `paths`; the server is stopped afterwards.
 * Shared by the serve and core benches.
 */
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { servingUrl } from '../../src/server/servingUrl.ts';

const kindred = join(fileURLToPath(new URL('../..', import.meta.url)), 'bin', 'kindred.js');

export interface ServeLoad {
  readonly storeDir: string;
  /** Extra `kindred serve` arguments, e.g. `['--cache', '0']`. */
  readonly serveArgs: readonly string[];
  readonly paths: readonly string[];
  readonly connections: number;
  readonly seconds: number;
  /** Something to do beside the load (e.g. reloads), started once the server answers; returns its stop. */
  readonly beside?: (url: string) => () => Promise<void>;
}

export async function serveUnderLoad(load: ServeLoad): ReturnType<typeof autocannon> {
  const args = [kindred, 'serve', '--store', load.storeDir, '--port', '0', ...load.serveArgs];
  const child = spawn(process.execPath, args, { stdio: ['ignore', 'pipe', 'ignore'] });
  const url = await servingUrl(child);
  try {
    let next = 0;
    const warm = await fetch(new URL(load.paths[0] ?? '/api/info', url));
    if (warm.status !== 200) throw new Error(`warm-up answered ${warm.status}`);
    const stop = load.beside?.(url);
    try {
      return await autocannon({
        url,
        connections: load.connections,
        duration: load.seconds,
        requests: [{ setupRequest: (req) => ({ ...req, path: load.paths[next++ % load.paths.length] ?? '/api/info' }) }],
      });
    } finally {
      await stop?.();
    }
  } finally {
    child.kill('SIGTERM');
    await new Promise((r) => child.once('exit', r));
  }
}
