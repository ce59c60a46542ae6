import type { LoadedStore } from './LoadedStore.ts';
import type { StoreHolder } from './StoreHolder.ts';

/** What a server endpoint gets: the store holder (read `current` once per request) and the query string. */
export interface EndpointContext {
  readonly holder: StoreHolder;
  readonly query: URLSearchParams;
  /** A store endpoint's answer as the server gives it (from the cache, the answer workers or this thread), as JSON text. */
  readonly storeAnswer: (path: string, query: string) => Promise<JsonText>;
}

/** An answer already serialised: sent as it is. */
export class JsonText {
  readonly text: string;

  constructor(text: string) {
    this.text = text;
  }
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

/** An endpoint answered on the server's own thread, not cached (reload, dims); a JsonText answer is sent as it is. */
export interface ServerEndpoint {
  readonly methods: readonly ('GET' | 'POST')[];
  readonly cacheable: false;
  readonly answer: (ctx: EndpointContext) => unknown;
}

/** One JSON endpoint: the methods it takes and the answer it gives (thrown errors become error bodies). */
export type Endpoint = StoreEndpoint | ServerEndpoint;
