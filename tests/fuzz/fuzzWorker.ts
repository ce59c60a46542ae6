/**
 * Child process of the fuzz runner (tests/fuzz/runInChild.ts): reads one JSON line per mutant from
 * stdin, `{ id, commands: string[][], stopOnStoreError }`, and runs each command with the CLI's
 * `main(argv, io)` in this process. Before each command it writes `{"id","step"}` (so the parent can
 * time it and name it if this process dies), after the mutant `{"id","results"}`: per command its exit
 * code, the `kindred.*` error codes it printed and whether it reported an unexpected failure (an error
 * outside the Kindred hierarchy). A native crash ends this process by a signal; the parent sees it.
 */
import { createInterface } from 'node:readline';
import { main } from '../../src/cli/main.ts';

export interface FuzzJob {
  readonly id: number;
  readonly commands: readonly (readonly string[])[];
  /** Stop after the first command that reports a `kindred.store.*` error. */
  readonly stopOnStoreError: boolean;
}

export interface CommandOutcome {
  readonly code: number;
  readonly errorCodes: readonly string[];
  readonly unexpected: boolean;
  /** The first 300 characters of stderr, for the report. */
  readonly stderr: string;
}

const lines = createInterface({ input: process.stdin });
const send = (message: unknown): void => {
  process.stdout.write(`${JSON.stringify(message)}\n`);
};

for await (const line of lines) {
  if (line.trim() === '') continue;
  const job: FuzzJob = JSON.parse(line);
  const results: CommandOutcome[] = [];
  for (const [step, argv] of job.commands.entries()) {
    send({ id: job.id, step });
    let stderr = '';
    const code = await main(argv, {
      stdout: { write: () => true },
      stderr: { write: (s: string) => (stderr += s) },
      isTTY: false,
    });
    const errorCodes = [...stderr.matchAll(/\[(kindred\.[a-zA-Z]+\.[a-zA-Z]+)\]/g)].map((m) => m[1] ?? '');
    results.push({ code, errorCodes, unexpected: stderr.includes('unexpected failure'), stderr: stderr.slice(0, 300) });
    if (job.stopOnStoreError && errorCodes.some((c) => c.startsWith('kindred.store.'))) break;
  }
  send({ id: job.id, results });
}
