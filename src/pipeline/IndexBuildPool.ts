import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import { IndexError, StoreError } from '../errors/KindredError.ts';
import { GuardedIndex } from '../ann/GuardedIndex.ts';
import type { IndexParams } from '../ann/IndexParams.ts';
import { isIndexJobDone, type IndexJob } from './indexJob.ts';

interface Pending {
  readonly job: IndexJob;
  /**
   * The job's vector values, counted when it is sent: the vectors' buffer is transferred to the worker,
   * after which `job.vectors` reads as empty in this thread.
   */
  readonly values: number;
  readonly resolve: (bytes: Uint8Array) => void;
  readonly reject: (error: unknown) => void;
}

/**
 * Builds HNSW indexes in up to `threads` worker threads (node:worker_threads) and hands back each saved
 * file's bytes. Each job is sent to its worker at once, to the one with the least work queued (by
 * vector count), and waits in that worker's own queue: a worker never waits for this thread to hand
 * it its next job, so the indexes go on building while this thread computes (the build profiles the
 * windows meanwhile). With `threads` 1 every index is built in the calling thread instead. Either way
 * an index is built by GuardedIndex with the same parameters, seed and insertion order, so its file is
 * byte for byte the same (hnswlib builds are deterministic under those).
 * The vectors given to `build` are handed over to the worker (their buffer is transferred, not copied),
 * so memory stays at one copy of each index's rows.
 */
export class IndexBuildPool {
  readonly threads: number;
  /** Each worker's jobs sent and not yet answered, in the order sent (a worker answers in that order). */
  readonly #queues = new Map<Worker, Pending[]>();
  #nextId = 0;
  #failed: unknown = null;

  constructor(threads: number) {
    this.threads = Math.max(1, Math.floor(threads));
  }

  /** Builds and saves an index of `vectors` (row-major, `dim` wide) at `path`; resolves to the file's bytes. */
  build(vectors: Float32Array, dim: number, params: IndexParams, path: string): Promise<Uint8Array> {
    if (this.threads === 1) {
      return (async () => {
        GuardedIndex.build(vectors, dim, params).save(path);
        return readFile(path);
      })();
    }
    return new Promise<Uint8Array>((resolve, reject) => {
      if (this.#failed) {
        reject(this.#failed);
        return;
      }
      const pending: Pending = { job: { id: this.#nextId++, vectors, dim, params, path }, values: vectors.length, resolve, reject };
      const worker = this.#leastLoaded();
      this.#queues.get(worker)?.push(pending);
      const buffer = vectors.buffer;
      worker.postMessage(pending.job, buffer instanceof ArrayBuffer ? [buffer] : []);
    });
  }

  /** Per worker thread started, the vector values of the jobs it has been sent and not yet answered. */
  queuedValues(): number[] {
    return [...this.#queues.values()].map((queue) => queue.reduce((a, p) => a + p.values, 0));
  }

  /** Stops the worker threads (after the jobs handed out have been answered or failed). */
  async close(): Promise<void> {
    const workers = [...this.#queues.keys()];
    this.#queues.clear();
    await Promise.all(workers.map((w) => w.terminate()));
  }

  /** An idle worker (a new one while fewer than `threads` run), else the one with the fewest vector values queued. */
  #leastLoaded(): Worker {
    let best: Worker | null = null;
    let bestLoad = Infinity;
    for (const [worker, queue] of this.#queues) {
      const load = queue.reduce((a, p) => a + p.values, 0);
      if (load < bestLoad) {
        best = worker;
        bestLoad = load;
      }
    }
    if (best && (bestLoad === 0 || this.#queues.size >= this.threads)) return best;
    return this.#spawn();
  }

  #spawn(): Worker {
    // The worker runs TypeScript: it registers the loader the CLI uses (by absolute path), then imports it.
    const tsxDir = dirname(createRequire(import.meta.url).resolve('tsx/package.json'));
    const loader = pathToFileURL(join(tsxDir, 'dist', 'esm', 'api', 'index.mjs')).href;
    const entry = new URL('./indexWorker.ts', import.meta.url).href;
    const boot = `import(${JSON.stringify(loader)}).then((m) => { m.register(); return import(${JSON.stringify(entry)}); })`;
    const worker = new Worker(boot, { eval: true });
    this.#queues.set(worker, []);
    worker.on('message', (message: unknown) => {
      const pending = this.#queues.get(worker)?.[0];
      if (!pending || !isIndexJobDone(message) || message.id !== pending.job.id) {
        this.#fail(new IndexError('kindred.index.native', 'a build worker answered out of turn', { stage: 'build' }));
        return;
      }
      this.#queues.get(worker)?.shift();
      const error = message.error;
      if (error) {
        pending.reject(
          error.code === 'kindred.store.writeFailed'
            ? new StoreError('kindred.store.writeFailed', error.message, { file: pending.job.path })
            : new IndexError('kindred.index.native', `index build failed in a worker thread: ${error.message}`, { stage: 'build' }),
        );
      } else {
        readFile(pending.job.path).then(pending.resolve, pending.reject);
      }
    });
    worker.on('error', (error) => this.#fail(new IndexError('kindred.index.native', `a build worker stopped: ${error.message}`, { stage: 'build' })));
    worker.on('exit', (code) => {
      if ((this.#queues.get(worker)?.length ?? 0) > 0) this.#fail(new IndexError('kindred.index.native', `a build worker exited (code ${code}) during a build`, { stage: 'build' }));
    });
    return worker;
  }

  /** A worker that broke fails every job in flight or waiting; later builds are refused. */
  #fail(error: IndexError): void {
    if (!this.#failed) this.#failed = error;
    for (const queue of this.#queues.values()) for (const p of queue.splice(0)) p.reject(error);
  }
}
