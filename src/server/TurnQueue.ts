/** Milliseconds of queued work run before the event loop gets a turn again (a project choice: a few answers). */
export const DEFAULT_SLICE_MS = 4;

/** A queued task with its caller's promise settled inside: run it, never throws. */
type Task = () => void;

/**
 * Runs CPU-bound work (computing uncached answers) first come, first served, a slice of `sliceMs` at
 * a time, then yields to the event loop (setImmediate) so that it can accept connections and read
 * requests between slices. Why: answered straight from the request handler, a burst of 200 requests
 * kept the event loop busy for some 200 ms per round, new connections waited in the accept queue,
 * and on this machine some were not taken in for 10 s (the load generator's timeout).
 * A task's synchronous part runs inside a slice; a task that returns a promise settles its caller's
 * promise when that promise settles.
 *
 * @example
 * const q = new TurnQueue();
 * await q.run(() => 6 * 7); // => 42
 */
export class TurnQueue {
  readonly sliceMs: number;
  readonly #tasks: Task[] = [];
  #head = 0;
  #scheduled = false;

  constructor(sliceMs: number = DEFAULT_SLICE_MS) {
    if (!(sliceMs >= 0) || !Number.isFinite(sliceMs)) throw new RangeError(`slice must be a finite number of milliseconds >= 0, got ${sliceMs}`);
    this.sliceMs = sliceMs;
  }

  /** Tasks waiting for a slice. */
  get waiting(): number {
    return this.#tasks.length - this.#head;
  }

  /** Queues `task`; settles with what it returns or throws. */
  run<T>(task: () => T | Promise<T>): Promise<T> {
    return new Promise<T>((resolve, reject) => {
      this.#tasks.push(() => {
        try {
          resolve(task());
        } catch (e) {
          reject(e);
        }
      });
      this.#schedule();
    });
  }

  #schedule(): void {
    if (this.#scheduled || this.waiting === 0) return;
    this.#scheduled = true;
    setImmediate(() => this.#drain());
  }

  #drain(): void {
    this.#scheduled = false;
    const started = performance.now();
    do {
      const t = this.#tasks[this.#head++];
      if (!t) break;
      t();
    } while (this.waiting > 0 && performance.now() - started < this.sliceMs);
    if (this.#head > 1024 && this.#head * 2 > this.#tasks.length) {
      this.#tasks.splice(0, this.#head);
      this.#head = 0;
    }
    this.#schedule();
  }
}
