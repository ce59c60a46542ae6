import type { CliIo } from '../../src/cli/CliIo.ts';

/** A CliIo that keeps what a command writes, for running a CLI command inside the server. */
export function captureIo(): { io: CliIo; stdout: () => string; stderr: () => string } {
  let out = '';
  let err = '';
  return {
    io: {
      stdout: { write: (s: string) => (out += s) },
      stderr: { write: (s: string) => (err += s) },
      isTTY: false,
    },
    stdout: () => out,
    stderr: () => err,
  };
}
