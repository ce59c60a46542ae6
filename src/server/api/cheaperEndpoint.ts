import { answerCheaper } from '../../request/answerCheaper.ts';
import { readRequest } from '../../request/readRequest.ts';
import type { StoreEndpoint } from '../Endpoint.ts';

/**
 * `GET /api/cheaper?player=ID&max-salary=USD...`: what `kindred cheaper ID ... --format json` prints:
 * comps with a known salary under the limit (default: half the target's), the value frontier marked.
 */
export const cheaperEndpoint: StoreEndpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: (loaded, query) => answerCheaper(loaded.store, readRequest('cheaper', 'http', query)),
};
