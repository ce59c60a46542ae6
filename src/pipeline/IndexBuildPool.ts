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
  readonly resolve: (bytes: Uint8Array) => void;
  readonly reject: (error: unknown) => void;
}

/**
 * Builds HNSW indexes in up to `threads` worker threads (node:worker_threads), largest waiting job
 * first, and hands back each saved file's bytes. With `threads` 1 every index is built in the calling
 * thread instead. Either way an index is built by GuardedIndex with the same parameters, seed and
 * insertion order, so its file is byte for byte the same (hnswlib builds are deterministic under those).
 * The vectors given to `build` are handed over to the worker (their buffer is transferred, not copied),
 * so memory stays at one copy of each index's rows.
 */
export class IndexBuildPool {
  readonly threads: number;
  readonly #idle: Worker[] = [];
  readonly #busy = new Map<Worker, Pending>();
  readonly #waiting: Pending[] = [];
  #started = 0;
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
      this.#waiting.push({ job: { id: this.#nextId++, vectors, dim, params, path }, resolve, reject });
      this.#dispatch();
    });
  }

  /** Stops the worker threads (after the jobs handed out have been answered or failed). */
  async close(): Promise<void> {
    const workers = [...this.#idle, ...this.#busy.keys()];
    this.#idle.length = 0;
    await Promise.all(workers.map((w) => w.terminate()));
  }

  #dispatch(): void {
    while (this.#waiting.length > 0) {
      let worker = this.#idle.pop();
      if (!worker && this.#started < this.threads) worker = this.#spawn();
      if (!worker) return;
      // the largest waiting job first, so that one long build does not start last
      let at = 0;
      for (let i = 1; i < this.#waiting.length; i++) {
        if ((this.#waiting[i]?.job.vectors.length ?? 0) > (this.#waiting[at]?.job.vectors.length ?? 0)) at = i;
      }
      const [next] = this.#waiting.splice(at, 1);
      if (!next) return;
      this.#busy.set(worker, next);
      const buffer = next.job.vectors.buffer;
      worker.postMessage(next.job, buffer instanceof ArrayBuffer ? [buffer] : []);
    }
  }

  #spawn(): Worker {
    this.#started++;
    // The worker runs TypeScript: it registers the loader the CLI uses (by absolute path), then imports it.
    const tsxDir = dirname(createRequire(import.meta.url).resolve('tsx/package.json'));
    const loader = pathToFileURL(join(tsxDir, 'dist', 'esm', 'api', 'index.mjs')).href;
    const entry = new URL('./indexWorker.ts', import.meta.url).href;
    const boot = `import(${JSON.stringify(loader)}).then((m) => { m.register(); return import(${JSON.stringify(entry)}); })`;
    const worker = new Worker(boot, { eval: true });
    worker.on('message', (message: unknown) => {
      const pending = this.#busy.get(worker);
      if (!pending || !isIndexJobDone(message) || message.id !== pending.job.id) {
        this.#fail(new IndexError('kindred.index.native', 'a build worker answered out of turn', { stage: 'build' }));
        return;
      }
      this.#busy.delete(worker);
      this.#idle.push(worker);
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
      this.#dispatch();
    });
    worker.on('error', (error) => this.#fail(new IndexError('kindred.index.native', `a build worker stopped: ${error.message}`, { stage: 'build' })));
    worker.on('exit', (code) => {
      if (this.#busy.has(worker)) this.#fail(new IndexError('kindred.index.native', `a build worker exited (code ${code}) during a build`, { stage: 'build' }));
    });
    return worker;
  }

  /** A worker that broke fails every job in flight or waiting; later builds are refused. */
  #fail(error: IndexError): void {
    if (!this.#failed) this.#failed = error;
    for (const p of this.#busy.values()) p.reject(error);
    this.#busy.clear();
    for (const p of this.#waiting.splice(0)) p.reject(error);
  }
}
