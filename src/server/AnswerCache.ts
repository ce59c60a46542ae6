/** Bytes kept in one store's answer cache at most (a project choice: a small share of the server's memory). */
export const DEFAULT_CACHE_BYTES = 32 * 1024 * 1024;

/** Answers larger than this are answered but never kept (a project choice: some 25 ordinary answers). */
export const DEFAULT_ENTRY_BYTES = 512 * 1024;

export interface CacheLimits {
  /** Bytes of serialised answers kept at most (UTF-8 length of the JSON text). */
  readonly maxBytes: number;
  /** An answer longer than this is not kept. */
  readonly maxEntryBytes: number;
}

/**
 * The last answers given, as serialised JSON, evicting the least recently used (a Map keeps insertion
 * order: a hit is moved to the end, the first key is the oldest) while there are more than `capacity`
 * entries or more than `maxBytes` bytes; an answer over `maxEntryBytes` is never kept. One cache per
 * loaded store, so a reload never serves an answer of the old store.
 */
export class AnswerCache {
  readonly capacity: number;
  readonly limits: CacheLimits;
  readonly #entries = new Map<string, { readonly text: string; readonly bytes: number }>();
  #bytes = 0;

  constructor(capacity: number, limits: Partial<CacheLimits> = {}) {
    if (!Number.isInteger(capacity) || capacity < 0) throw new RangeError(`cache capacity must be a whole number >= 0, got ${capacity}`);
    this.capacity = capacity;
    this.limits = { maxBytes: DEFAULT_CACHE_BYTES, maxEntryBytes: DEFAULT_ENTRY_BYTES, ...limits };
  }

  get size(): number {
    return this.#entries.size;
  }

  /** Bytes of the answers kept now. */
  get bytes(): number {
    return this.#bytes;
  }

  get(key: string): string | undefined {
    const v = this.#entries.get(key);
    if (v === undefined) return undefined;
    this.#entries.delete(key);
    this.#entries.set(key, v);
    return v.text;
  }

  set(key: string, text: string): void {
    if (this.capacity === 0) return;
    const bytes = Buffer.byteLength(text) + Buffer.byteLength(key);
    this.#drop(key);
    if (bytes > this.limits.maxEntryBytes || bytes > this.limits.maxBytes) return;
    this.#entries.set(key, { text, bytes });
    this.#bytes += bytes;
    while (this.#entries.size > this.capacity || this.#bytes > this.limits.maxBytes) {
      const oldest = this.#entries.keys().next();
      if (oldest.done) break;
      this.#drop(oldest.value);
    }
  }

  #drop(key: string): void {
    const v = this.#entries.get(key);
    if (v === undefined) return;
    this.#entries.delete(key);
    this.#bytes -= v.bytes;
  }
}

/** A cache key that does not depend on the order of the parameters. */
export function cacheKey(path: string, query: URLSearchParams): string {
  const pairs = [...query].sort(([a, x], [b, y]) => (a < b ? -1 : a > b ? 1 : x < y ? -1 : x > y ? 1 : 0));
  return `${path}?${new URLSearchParams(pairs).toString()}`;
}
