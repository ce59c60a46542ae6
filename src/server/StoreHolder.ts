import { LoadedStore } from './LoadedStore.ts';
import { loadServedStore, type ServedStore } from './loadServedStore.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';

/** Loads the store in `dir`; `previous`, on a reload, is the store served until now (its unchanged parts may be taken over). */
export type StoreLoader = (dir: string, previous?: ProfileStore) => Promise<ServedStore>;

/**
 * Others who answer from the holder's store (the answer pool's worker threads, each with its own copy):
 * `prepare` opens the next store there and settles once all have it (a rejection fails the reload,
 * and the old store stays everywhere); `commit` follows the swap.
 */
export interface StoreSwitch {
  prepare(next: LoadedStore): Promise<void>;
  commit(next: LoadedStore): void;
}

/**
 * The store the server answers from. Queries read `current` and never wait; `reload` opens the
 * store folder again (manifest and checksums verified by openProfileStore; the groups whose files
 * are unchanged are taken over from the current store instead of read again) and swaps it in
 * only when that succeeded, so a query sees the old store or the new one, never a mix. A failed
 * reload leaves the old store in place and rejects with the load error. Reloads run one at a time.
 * With a StoreSwitch attached, the new store is swapped in only once the switch has prepared it too.
 */
export class StoreHolder {
  readonly dir: string;
  readonly #load: StoreLoader;
  readonly #cacheEntries: number;
  #current: LoadedStore;
  #queue: Promise<unknown> = Promise.resolve();
  #switch: StoreSwitch | undefined;

  private constructor(dir: string, first: LoadedStore, load: StoreLoader, cacheEntries: number) {
    this.dir = dir;
    this.#current = first;
    this.#load = load;
    this.#cacheEntries = cacheEntries;
  }

  /** Loads the store; `cacheEntries` answers are kept per loaded store (0: none). */
  static async open(dir: string, load: StoreLoader = loadServedStore, cacheEntries = 0): Promise<StoreHolder> {
    return new StoreHolder(dir, new LoadedStore(await load(dir), 1, cacheEntries), load, cacheEntries);
  }

  get current(): LoadedStore {
    return this.#current;
  }

  /** From now on, reloads are prepared by `to` before the swap and committed to it after. */
  attach(to: StoreSwitch): void {
    this.#switch = to;
  }

  reload(): Promise<LoadedStore> {
    const next = this.#queue.then(async () => {
      const served = await this.#load(this.dir, this.#current.store);
      const loaded = new LoadedStore(served, this.#current.generation + 1, this.#cacheEntries);
      await this.#switch?.prepare(loaded);
      this.#current = loaded;
      this.#switch?.commit(loaded);
      return loaded;
    });
    this.#queue = next.catch(() => undefined);
    return next;
  }
}
