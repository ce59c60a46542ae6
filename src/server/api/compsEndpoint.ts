import { answerComps } from '../../request/answerComps.ts';
import { readRequest } from '../../request/readRequest.ts';
import type { StoreEndpoint } from '../Endpoint.ts';

/** `GET /api/comps?player=ID&season=Y&k=N...`: what `kindred comps ID --season Y --k N --format json` prints. */
export const compsEndpoint: StoreEndpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: (loaded, query) => answerComps(loaded.store, readRequest('comps', 'http', query)),
};
