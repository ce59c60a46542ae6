/** Runs the CLI in-process and captures what it writes. */
import { main } from '../../src/cli/main.ts';

export interface CliRun {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

export async function runCli(...argv: string[]): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await main(argv, {
    stdout: { write: (s: string) => (stdout += s) },
    stderr: { write: (s: string) => (stderr += s) },
    isTTY: false,
  });
  return { code, stdout, stderr };
}
