#!/usr/bin/env node
// Entry point: registers the TypeScript loader, runs the CLI, and is the only place that sets the exit code.
import { register } from 'tsx/esm/api';

register();
// A reader that stops early (`kindred comps ... | head`) closes the pipe: end quietly, as other tools do.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (error) => {
    if (error.code === 'EPIPE') process.exit(0);
    throw error;
  });
}
const { main } = await import('../src/cli/main.ts');
process.exitCode = await main(process.argv.slice(2), {
  stdout: process.stdout,
  stderr: process.stderr,
  isTTY: Boolean(process.stderr.isTTY),
});
