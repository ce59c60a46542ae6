import { StoreError } from '../../errors/KindredError.ts';
import type { BacktestAnswer } from '../../request/apiContract.ts';
import { answerBacktest } from '../../request/answerBacktest.ts';
import { readRequest } from '../../request/readRequest.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import type { StoreEndpoint } from '../Endpoint.ts';

/**
 * `GET /api/backtest[?cuts=2016,2018][&group=hitters]`: what `kindred backtest --format json` prints: the
 * prospect outlook replayed at past cut seasons with only what was known at each (kept per store and
 * query in the answer cache: a replay takes seconds).
 */
export function answerBacktestOver(loaded: LoadedStore, query: URLSearchParams): BacktestAnswer {
  const req = readRequest('backtest', 'http', query);
  if (loaded.outcomes instanceof StoreError) throw loaded.outcomes;
  return answerBacktest(loaded.store, loaded.outcomes, req);
}

export const backtestEndpoint: StoreEndpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: answerBacktestOver,
};
