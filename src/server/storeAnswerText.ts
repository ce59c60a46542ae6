import type { StoreEndpoint } from './Endpoint.ts';
import type { LoadedStore } from './LoadedStore.ts';

/**
 * The JSON text of a store endpoint's answer over one loaded store: what the server sends and caches.
 * The one place it is made, on the server's thread and in the answer pool's workers alike, so both
 * give the same bytes.
 */
export function storeAnswerText(endpoint: StoreEndpoint, loaded: LoadedStore, query: URLSearchParams): string | Promise<string> {
  const answer = endpoint.answer(loaded, query);
  return answer instanceof Promise ? answer.then((a: unknown) => JSON.stringify(a)) : JSON.stringify(answer);
}
