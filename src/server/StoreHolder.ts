import { LoadedStore } from './LoadedStore.ts';
import { loadServedStore, type ServedStore } from './loadServedStore.ts';

export type StoreLoader = (dir: string) => Promise<ServedStore>;

/**
 * The store the server answers from. Queries read `current` and never wait; `reload` reads the
 * store folder again in full (manifest and checksums verified by openProfileStore) and swaps it in
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
      const served = await this.#load(this.dir);
      this.#current = new LoadedStore(served, this.#current.generation + 1, this.#cacheEntries);
      return this.#current;
    });
    this.#queue = next.catch(() => undefined);
    return next;
  }
}
