import { answerComps } from '../../request/answerComps.ts';
import { readRequest } from '../../request/readRequest.ts';
import type { Endpoint } from '../Endpoint.ts';

/** `GET /api/comps?player=ID&season=Y&k=N...`: what `kindred comps ID --season Y --k N --format json` prints. */
export const compsEndpoint: Endpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: ({ holder, query }) => answerComps(holder.current.store, readRequest('comps', 'http', query)),
};
