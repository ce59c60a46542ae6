import { Worker } from 'node:worker_threads';
import { StoreError } from '../../errors/KindredError.ts';
import { HttpError } from '../HttpError.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import type { StoreSwitch } from '../StoreHolder.ts';
import type { FromWorker, PoolStore, ToWorker } from './poolMessages.ts';
import { WorkerAnswerError } from './WorkerAnswerError.ts';
import { WORKER_ENTRY } from './workerEntry.ts';

/** Requests a worker is given at once (a project choice: the next one is there when it finishes one). */
export const WORKER_DEPTH = 2;

/** An answer and the store generation it was computed from (cached only if that is still the current one). */
export interface PoolAnswer {
  readonly text: string;
  readonly generation: number;
}

/** Computes an answer on the server's own thread: used when no worker has the current store open. */
export type InThread = (path: string, query: string) => Promise<PoolAnswer>;

interface Job {
  readonly path: string;
  readonly query: string;
  readonly resolve: (a: PoolAnswer) => void;
  readonly reject: (e: unknown) => void;
}

interface Running extends Job {
  readonly generation: number;
}

interface Opening {
  readonly resolve: () => void;
  readonly reject: (e: unknown) => void;
}

/** One worker thread and what the pool knows of it. */
interface Slot {
  readonly worker: Worker;
  /** Generations the worker has open. */
  readonly ready: Set<number>;
  readonly running: Map<number, Running>;
  readonly opening: Map<number, Opening>;
  alive: boolean;
}

/** Restart delays after a worker died, growing while it keeps dying soon after its start (a project choice). */
const RESTART_MS = [0, 100, 500, 2000, 5000];
/** A worker that lived this long counts as healthy again: its next restart is immediate. */
const HEALTHY_MS = 10_000;

/**
 * Worker threads computing the uncached answers of store endpoints (comps, prospect, cheaper, match,
 * backtest, players, map, info) while the server's thread does HTTP and the answer cache, and never
 * reads a group itself. Each worker opens every store
 * build the server serves from the store folder itself (lazily: the players at once, a group when
 * first asked for) and answers from the build a request was given, so an answer never mixes builds:
 * - a request gets the current generation when it is handed to a worker (queued ones wait here);
 * - a reload (StoreSwitch): `prepare` opens the new build in every live worker and settles when all
 *   have it; if any fails, the reload fails and the workers forget the new build, the old one
 *   serving everywhere; `commit` makes it current; an old build is retired once no worker answers from it;
 * - a worker that dies (crash, out of memory, terminate) fails its running requests with a 503
 *   (`kindred.http.workerFailed`), never leaves them hanging, and is started again; while no worker
 *   has the current store open, requests are answered on the server's thread (`inThread`).
 */
export class AnswerPool implements StoreSwitch {
  readonly size: number;
  readonly #slots: Slot[] = [];
  readonly #queue: Job[] = [];
  readonly #inThread: InThread;
  readonly #log: (line: string) => void;
  #current: PoolStore;
  #nextId = 1;
  #closed = false;
  /** Per slot index: deaths in a row soon after a start. */
  readonly #deaths: number[] = [];

  private constructor(size: number, first: PoolStore, inThread: InThread, log: (line: string) => void) {
    this.size = size;
    this.#current = first;
    this.#inThread = inThread;
    this.#log = log;
  }

  /** Starts `size` workers and opens `first` in each; rejects (and stops them) if any fails to open it. */
  static async start(size: number, first: LoadedStore, dir: string, inThread: InThread, log: (line: string) => void): Promise<AnswerPool> {
    if (!Number.isInteger(size) || size < 1) throw new RangeError(`an answer pool needs a whole number of workers >= 1, got ${size}`);
    const pool = new AnswerPool(size, poolStoreOf(first, dir), inThread, log);
    for (let i = 0; i < size; i++) {
      pool.#deaths.push(0);
      pool.#slots.push(pool.#spawn(i));
    }
    try {
      await Promise.all(pool.#slots.map((s) => pool.#open(s, pool.#current)));
    } catch (e) {
      await pool.close();
      throw e;
    }
    return pool;
  }

  /** The worker threads now (for tests and the bench: e.g. their thread ids). */
  get workers(): readonly Worker[] {
    return this.#slots.map((s) => s.worker);
  }

  /** Requests waiting for a worker. */
  get waiting(): number {
    return this.#queue.length;
  }

  /** The answer to `path?query` (a store endpoint), from a worker or, when none can take it, from the server's thread. */
  run(path: string, query: string): Promise<PoolAnswer> {
    if (!this.#slots.some((s) => this.#serves(s))) return this.#inThread(path, query);
    return new Promise<PoolAnswer>((resolve, reject) => {
      this.#queue.push({ path, query, resolve, reject });
      this.#dispatch();
    });
  }

  prepare(next: LoadedStore): Promise<void> {
    const store = poolStoreOf(next, this.#current.dir);
    const live = this.#slots.filter((s) => s.alive);
    const opens = live.map((s) => this.#open(s, store));
    return Promise.allSettled(opens).then((results) => {
      const failed = results.find((r): r is PromiseRejectedResult => r.status === 'rejected');
      if (!failed) return;
      for (const s of live) this.#retire(s, store.generation);
      throw failed.reason;
    });
  }

  commit(next: LoadedStore): void {
    this.#current = poolStoreOf(next, this.#current.dir);
    for (const s of this.#slots) {
      if (!s.alive) continue;
      for (const g of [...s.ready]) if (g !== next.generation && ![...s.running.values()].some((r) => r.generation === g)) this.#retire(s, g);
      if (!s.ready.has(next.generation) && !s.opening.has(next.generation)) this.#open(s, this.#current).catch((e: unknown) => this.#openLost(e));
    }
    this.#dispatch();
  }

  /** Stops every worker; requests still waiting or running are failed. */
  async close(): Promise<void> {
    this.#closed = true;
    const stopped = new HttpError(503, 'kindred.http.workerFailed', 'the server is stopping');
    for (const job of this.#queue.splice(0)) job.reject(stopped);
    await Promise.all(this.#slots.map((s) => s.worker.terminate()));
  }

  #serves(s: Slot): boolean {
    return s.alive && s.ready.has(this.#current.generation);
  }

  #dispatch(): void {
    while (this.#queue.length > 0) {
      let best: Slot | undefined;
      for (const s of this.#slots) if (this.#serves(s) && s.running.size < WORKER_DEPTH && (!best || s.running.size < best.running.size)) best = s;
      if (!best) {
        // nobody can take it now: if nobody will (every worker dead or without the current store), answer here
        if (!this.#slots.some((s) => this.#serves(s))) for (const job of this.#queue.splice(0)) this.#inThread(job.path, job.query).then(job.resolve, job.reject);
        return;
      }
      const job = this.#queue.shift();
      if (!job) return;
      const id = this.#nextId++;
      const generation = this.#current.generation;
      best.running.set(id, { ...job, generation });
      this.#post(best, { type: 'answer', id, generation, path: job.path, query: job.query });
    }
  }

  #post(s: Slot, m: ToWorker): void {
    s.worker.postMessage(m);
  }

  #open(s: Slot, store: PoolStore): Promise<void> {
    return new Promise<void>((resolve, reject) => {
      s.opening.set(store.generation, { resolve, reject });
      this.#post(s, { type: 'open', store });
    });
  }

  #retire(s: Slot, generation: number): void {
    s.ready.delete(generation);
    if (s.alive) this.#post(s, { type: 'retire', generation });
  }

  #openLost(e: unknown): void {
    if (!this.#closed) this.#log(`kindred serve: an answer thread could not open the store (answering on the server's thread meanwhile): ${e instanceof Error ? e.message : String(e)}`);
  }

  #spawn(index: number): Slot {
    const worker = startWorker();
    const slot: Slot = { worker, ready: new Set(), running: new Map(), opening: new Map(), alive: true };
    const started = performance.now();
    worker.on('message', (m: FromWorker) => this.#receive(slot, m));
    worker.on('error', (e: Error) => {
      if (!this.#closed) this.#log(`kindred serve: an answer thread failed: ${e.stack ?? e.message}`);
    });
    worker.on('exit', (code: number) => {
      slot.alive = false;
      const lost = new HttpError(503, 'kindred.http.workerFailed', 'the thread computing this answer stopped before it was done (it is started again): try again', { 'Retry-After': '1' });
      for (const r of slot.running.values()) r.reject(lost);
      slot.running.clear();
      for (const o of slot.opening.values()) o.reject(new StoreError('kindred.store.corrupt', `an answer thread stopped (exit code ${code}) while it opened the store`, { code }));
      slot.opening.clear();
      if (this.#closed) return;
      this.#log(`kindred serve: an answer thread stopped (exit code ${code}); starting it again`);
      const healthy = performance.now() - started > HEALTHY_MS;
      const deaths = (this.#deaths[index] = healthy ? 0 : (this.#deaths[index] ?? 0) + 1);
      const delay = RESTART_MS[Math.min(deaths, RESTART_MS.length - 1)] ?? 0;
      setTimeout(() => this.#restart(index), delay).unref();
      this.#dispatch();
    });
    return slot;
  }

  #restart(index: number): void {
    if (this.#closed) return;
    const slot = this.#spawn(index);
    this.#slots[index] = slot;
    this.#open(slot, this.#current).then(
      () => this.#dispatch(),
      (e: unknown) => this.#openLost(e),
    );
  }

  #receive(s: Slot, m: FromWorker): void {
    switch (m.type) {
      case 'opened': {
        const o = s.opening.get(m.generation);
        s.opening.delete(m.generation);
        s.ready.add(m.generation);
        o?.resolve();
        this.#dispatch();
        return;
      }
      case 'openFailed': {
        const o = s.opening.get(m.generation);
        s.opening.delete(m.generation);
        const f = m.failure;
        o?.reject(new StoreError(f.code ?? 'kindred.store.corrupt', f.code === null ? `an answer thread could not open the store: ${f.message}` : f.message, f.context));
        return;
      }
      case 'answered':
      case 'failed': {
        const r = s.running.get(m.id);
        if (!r) return;
        s.running.delete(m.id);
        if (m.type === 'answered') r.resolve({ text: m.text, generation: r.generation });
        else r.reject(new WorkerAnswerError(m.failure));
        if (r.generation !== this.#current.generation && ![...s.running.values()].some((x) => x.generation === r.generation)) this.#retire(s, r.generation);
        this.#dispatch();
        return;
      }
    }
  }
}

/** The pool's name for a loaded store: its generation, folder and manifest. */
function poolStoreOf(loaded: LoadedStore, dir: string): PoolStore {
  return { generation: loaded.generation, dir, manifest: JSON.stringify(loaded.store.opened.manifest), loadedAt: loaded.loadedAt.toISOString() };
}

/**
 * A new answer worker: the compiled module as is; the TypeScript source through tsx, registered in
 * the worker first (a worker does not inherit the hooks of its parent thread).
 */
function startWorker(): Worker {
  if (!WORKER_ENTRY.pathname.endsWith('.ts')) return new Worker(WORKER_ENTRY);
  const tsx = import.meta.resolve('tsx/esm/api');
  const boot = `const { workerData } = require('node:worker_threads'); import(workerData.tsx).then(({ register }) => { register(); return import(workerData.entry); });`;
  return new Worker(boot, { eval: true, workerData: { tsx, entry: WORKER_ENTRY.href } });
}
