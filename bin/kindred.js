#!/usr/bin/env node
// Entry point: runs the CLI compiled at install (dist/cli.js, `npm run build`), in this process, and
// is the only place that sets the exit code. When that build is missing or older than a source file,
// it says so in one line and runs the TypeScript sources through tsx instead (slow to start).
import { readdirSync, statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const built = new URL('../dist/cli.js', import.meta.url);
const sources = fileURLToPath(new URL('../src', import.meta.url));

/** Modification time of the build, or undefined when there is none. */
function builtAt() {
  try {
    return statSync(built).mtimeMs;
  } catch {
    return undefined;
  }
}

/** Whether any TypeScript source the CLI may bundle is newer than `time`. */
function sourcesNewerThan(time) {
  for (const entry of readdirSync(sources, { recursive: true, withFileTypes: true })) {
    if (entry.isFile() && entry.name.endsWith('.ts') && statSync(`${entry.parentPath ?? entry.path}/${entry.name}`).mtimeMs > time) return true;
  }
  return false;
}

// A reader that stops early (`kindred comps ... | head`) closes the pipe: end quietly, as other tools do.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (error) => {
    if (error.code === 'EPIPE') process.exit(0);
    throw error;
  });
}

const time = builtAt();
let main;
if (time !== undefined && !sourcesNewerThan(time)) {
  ({ main } = await import(built.href));
} else {
  process.stderr.write(
    `kindred: ${time === undefined ? 'dist/cli.js is missing' : 'dist/cli.js is older than src/'}; running the sources through tsx (slow to start). \`npm run build\` compiles them.\n`,
  );
  const { register } = await import('tsx/esm/api');
  register();
  ({ main } = await import('../src/cli/main.ts'));
}
process.exitCode = await main(process.argv.slice(2), {
  stdout: process.stdout,
  stderr: process.stderr,
  isTTY: Boolean(process.stderr.isTTY),
});
