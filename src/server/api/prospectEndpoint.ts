import { StoreError } from '../../errors/KindredError.ts';
import type { ProspectResult } from '../../request/apiContract.ts';
import { answerProspect } from '../../request/answerProspect.ts';
import { readRequest } from '../../request/readRequest.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import type { StoreEndpoint } from '../Endpoint.ts';

/**
 * `GET /api/prospect?player=ID...`: what `kindred prospect ID ... --format json` prints: earlier
 * players at his level and age, and what became of them (outcomes read with the store).
 */
export function answerProspectOver(loaded: LoadedStore, query: URLSearchParams): ProspectResult {
  const req = readRequest('prospect', 'http', query);
  if (loaded.outcomes instanceof StoreError) throw loaded.outcomes;
  return answerProspect(loaded.store, loaded.outcomes, req, loaded.backtest);
}

export const prospectEndpoint: StoreEndpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: answerProspectOver,
};
