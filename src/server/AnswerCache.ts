/**
 * The last answers given, as serialised JSON, evicting the least recently used (a Map keeps insertion
 * order: a hit is moved to the end, the first key is the oldest). One cache per loaded store, so a
 * reload never serves an answer of the old store.
 */
export class AnswerCache {
  readonly capacity: number;
  readonly #entries = new Map<string, string>();

  constructor(capacity: number) {
    if (!Number.isInteger(capacity) || capacity < 0) throw new RangeError(`cache capacity must be a whole number >= 0, got ${capacity}`);
    this.capacity = capacity;
  }

  get size(): number {
    return this.#entries.size;
  }

  get(key: string): string | undefined {
    const v = this.#entries.get(key);
    if (v === undefined) return undefined;
    this.#entries.delete(key);
    this.#entries.set(key, v);
    return v;
  }

  set(key: string, value: string): void {
    if (this.capacity === 0) return;
    this.#entries.delete(key);
    this.#entries.set(key, value);
    while (this.#entries.size > this.capacity) {
      const oldest = this.#entries.keys().next();
      if (oldest.done) break;
      this.#entries.delete(oldest.value);
    }
  }
}

/** A cache key that does not depend on the order of the parameters. */
export function cacheKey(path: string, query: URLSearchParams): string {
  const pairs = [...query].sort(([a, x], [b, y]) => (a < b ? -1 : a > b ? 1 : x < y ? -1 : x > y ? 1 : 0));
  return `${path}?${new URLSearchParams(pairs).toString()}`;
}
