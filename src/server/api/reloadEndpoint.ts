import { JsonText, type ServerEndpoint } from '../Endpoint.ts';
import { noParameters } from '../../request/readRequest.ts';

/**
 * `POST /api/reload`: reads the store folder again and swaps it in; answers the new store's info (as
 * `GET /api/info` does: computed where the answers are, so the server's thread never reads a group for
 * it). A store that fails to load (missing, corrupt, half-written) is a 503 and the old one stays.
 */
export const reloadEndpoint: ServerEndpoint = {
  methods: ['POST'],
  cacheable: false,
  answer: async ({ holder, query, storeAnswer }): Promise<JsonText> => {
    noParameters(query);
    await holder.reload();
    return storeAnswer('/api/info', '');
  },
};
