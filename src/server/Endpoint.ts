import type { StoreHolder } from './StoreHolder.ts';

/** What an endpoint gets: the store holder (read `current` once per request) and the query string. */
export interface EndpointContext {
  readonly holder: StoreHolder;
  readonly query: URLSearchParams;
}

/** One JSON endpoint: the methods it takes and the answer it gives (thrown errors become error bodies). */
export interface Endpoint {
  readonly methods: readonly ('GET' | 'POST')[];
  readonly answer: (ctx: EndpointContext) => unknown;
  /** The answer depends only on the store and the query string: kept in the store's answer cache. */
  readonly cacheable: boolean;
}
