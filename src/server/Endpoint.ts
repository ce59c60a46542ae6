import type { LoadedStore } from './LoadedStore.ts';
import type { StoreHolder } from './StoreHolder.ts';

/** What a server endpoint gets: the store holder (read `current` once per request) and the query string. */
export interface EndpointContext {
  readonly holder: StoreHolder;
  readonly query: URLSearchParams;
}

/**
 * An endpoint whose answer depends only on one loaded store and the query string: kept in that store's
 * answer cache, and computed in the answer pool's worker threads when the server has any (the same
 * function runs there over the worker's own copy of the store).
 */
export interface StoreEndpoint {
  readonly methods: readonly 'GET'[];
  readonly cacheable: true;
  readonly answer: (loaded: LoadedStore, query: URLSearchParams) => unknown;
}

/** An endpoint answered on the server's own thread, not cached (reload, info, players, map, dims). */
export interface ServerEndpoint {
  readonly methods: readonly ('GET' | 'POST')[];
  readonly cacheable: false;
  readonly answer: (ctx: EndpointContext) => unknown;
}

/** One JSON endpoint: the methods it takes and the answer it gives (thrown errors become error bodies). */
export type Endpoint = StoreEndpoint | ServerEndpoint;
