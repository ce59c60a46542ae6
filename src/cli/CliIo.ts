/** Where the CLI writes: results to stdout, messages and progress to stderr. Swappable for tests. */
export interface CliIo {
  readonly stdout: { write(chunk: string): unknown };
  readonly stderr: { write(chunk: string): unknown };
  /** True when stderr is a terminal (progress bars are drawn only then). */
  readonly isTTY: boolean;
}
