import { answerMatch } from '../../request/answerMatch.ts';
import { readRequest } from '../../request/readRequest.ts';
import type { StoreEndpoint } from '../Endpoint.ts';

/**
 * `GET /api/match?player=A&candidate=B...`: what `kindred match A B ... --format json` prints (with
 * want in place of player: `kindred match --want ... B`): likeness, percentile in the pool and every dimension.
 */
export const matchEndpoint: StoreEndpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: (loaded, query) => answerMatch(loaded.store, readRequest('match', 'http', query)),
};
