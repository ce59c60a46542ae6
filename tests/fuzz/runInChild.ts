/**
 * Runs fuzz mutants in a child process (tests/fuzz/fuzzWorker.ts), one after another, so that a crash
 * in native code ends the child and not the runner. Each command has `timeoutMs` to finish; a child
 * that overruns is killed and the command counted as a hang. After a crash or a hang a fresh child
 * takes the next mutant; a child is also replaced every `recycleAfter` mutants.
 */
import { type ChildProcessWithoutNullStreams, spawn } from 'node:child_process';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';
import type { CommandOutcome, FuzzJob } from './fuzzWorker.ts';

const WORKER = fileURLToPath(new URL('./fuzzWorker.ts', import.meta.url));
const ROOT = fileURLToPath(new URL('../..', import.meta.url));

export type JobEnd =
  | { readonly kind: 'done'; readonly results: readonly CommandOutcome[] }
  | { readonly kind: 'crash'; readonly step: number; readonly signal: string | null; readonly code: number | null; readonly stderr: string }
  | { readonly kind: 'hang'; readonly step: number };

interface Running {
  readonly job: FuzzJob;
  step: number;
  timer: NodeJS.Timeout | undefined;
  readonly finish: (end: JobEnd) => void;
}

/** One child at a time; `run(job)` resolves when the mutant is done, has crashed the child or hung. */
export class ChildRunner {
  readonly #timeoutMs: number;
  readonly #recycleAfter: number;
  #child: ChildProcessWithoutNullStreams | undefined;
  #stderr = '';
  #served = 0;
  #running: Running | undefined;

  constructor(options: { timeoutMs: number; recycleAfter?: number }) {
    this.#timeoutMs = options.timeoutMs;
    this.#recycleAfter = options.recycleAfter ?? 400;
  }

  run(job: FuzzJob): Promise<JobEnd> {
    if (this.#child && this.#served >= this.#recycleAfter) this.#stop();
    const child = this.#child ?? this.#start();
    this.#served++;
    return new Promise<JobEnd>((resolve) => {
      this.#running = {
        job,
        step: -1,
        timer: undefined,
        finish: (end) => {
          const r = this.#running;
          if (r?.timer) clearTimeout(r.timer);
          this.#running = undefined;
          resolve(end);
        },
      };
      child.stdin.write(`${JSON.stringify(job)}\n`);
    });
  }

  close(): void {
    this.#stop();
  }

  #start(): ChildProcessWithoutNullStreams {
    const child = spawn(process.execPath, ['--import', 'tsx', WORKER], { cwd: ROOT, stdio: ['pipe', 'pipe', 'pipe'] });
    this.#child = child;
    this.#served = 0;
    this.#stderr = '';
    child.stderr.on('data', (c: Buffer) => {
      this.#stderr = (this.#stderr + c.toString('utf8')).slice(-2000);
    });
    createInterface({ input: child.stdout }).on('line', (line) => this.#onLine(line));
    child.on('exit', (code, signal) => {
      if (this.#child !== child) return; // stopped or killed on purpose (recycled, or a hang already counted)
      this.#child = undefined;
      const r = this.#running;
      if (r) r.finish({ kind: 'crash', step: r.step, signal, code, stderr: this.#stderr });
    });
    return child;
  }

  #onLine(line: string): void {
    const r = this.#running;
    if (!r) return;
    let message: { id?: number; step?: number; results?: CommandOutcome[] };
    try {
      message = JSON.parse(line);
    } catch {
      return; // a stray line on stdout (none expected: commands write to their own io)
    }
    if (message.id !== r.job.id) return;
    if (message.results) {
      r.finish({ kind: 'done', results: message.results });
      return;
    }
    if (typeof message.step === 'number') {
      r.step = message.step;
      if (r.timer) clearTimeout(r.timer);
      r.timer = setTimeout(() => {
        const running = this.#running;
        if (running !== r) return;
        this.#running = undefined;
        const child = this.#child;
        this.#child = undefined;
        child?.kill('SIGKILL');
        r.finish({ kind: 'hang', step: r.step });
      }, this.#timeoutMs);
    }
  }

  #stop(): void {
    const child = this.#child;
    this.#child = undefined;
    if (child) {
      child.stdin.end();
      child.kill('SIGKILL');
    }
  }
}
