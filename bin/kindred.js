#!/usr/bin/env node
// Entry point: registers the TypeScript loader, runs the CLI, and is the only place that sets the exit code.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../src/cli/main.ts');
process.exitCode = await main(process.argv.slice(2), {
  stdout: process.stdout,
  stderr: process.stderr,
  isTTY: Boolean(process.stderr.isTTY),
});
