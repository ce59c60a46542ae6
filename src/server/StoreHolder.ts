import { LoadedStore } from './LoadedStore.ts';
import { loadServedStore, type ServedStore } from './loadServedStore.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';

/** Loads the store in `dir`; `previous`, on a reload, is the store served until now (its unchanged parts may be taken over). */
export type StoreLoader = (dir: string, previous?: ProfileStore) => Promise<ServedStore>;

/**
 * The store the server answers from. Queries read `current` and never wait; `reload` opens the
 * store folder again (manifest and checksums verified by openProfileStore; the groups whose files
 * are unchanged are taken over from the current store instead of read again) and swaps it in
 * only when that succeeded, so a query sees the old store or the new one, never a mix. A failed
 * reload leaves the old store in place and rejects with the load error. Reloads run one at a time.
 */
export class StoreHolder {
  readonly dir: string;
  readonly #load: StoreLoader;
  readonly #cacheEntries: number;
  #current: LoadedStore;
  #queue: Promise<unknown> = Promise.resolve();

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

  reload(): Promise<LoadedStore> {
    const next = this.#queue.then(async () => {
      const served = await this.#load(this.dir, this.#current.store);
      this.#current = new LoadedStore(served, this.#current.generation + 1, this.#cacheEntries);
      return this.#current;
    });
    this.#queue = next.catch(() => undefined);
    return next;
  }
}
