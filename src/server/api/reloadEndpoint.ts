import type { ServerEndpoint } from '../Endpoint.ts';
import { noParameters } from '../../request/readRequest.ts';
import { answerInfo, type StoreInfo } from './infoEndpoint.ts';

/**
 * `POST /api/reload`: reads the store folder again in full and swaps it in; answers the new store's
 * info. A store that fails to load (missing, corrupt, half-written) is a 503 and the old one stays.
 */
export const reloadEndpoint: ServerEndpoint = {
  methods: ['POST'],
  cacheable: false,
  answer: async ({ holder, query }): Promise<StoreInfo> => {
    noParameters(query);
    const loaded = await holder.reload();
    return answerInfo(loaded, new URLSearchParams());
  },
};
