import { QueryError } from '../../errors/KindredError.ts';
import { ParameterError } from '../../errors/ParameterError.ts';
import { POSITION_GROUPS } from '../../profiles/positionGroup.ts';
import type { PoolMap } from '../../request/apiContract.ts';
import { readRequest } from '../../request/readRequest.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import type { StoreEndpoint } from '../Endpoint.ts';

/** `GET /api/map?group=G`: the pool of a position group on its first two principal components (cached per store). */
export function answerMap(loaded: LoadedStore, query: URLSearchParams): PoolMap {
  const group = readRequest('map', 'http', query).get('group');
  if (group === undefined) throw new ParameterError('group', `is required (${POSITION_GROUPS.join(', ')})`);
  if (group === 'hitters' || group === 'pitchers') throw new ParameterError('group', `expected one position group (${POSITION_GROUPS.join(', ')}), got "${group}"`, { context: { value: group } });
  const m = loaded.map(group);
  if (!m) throw new QueryError('kindred.query.emptyPool', `the store has no ${group} profiles`, { group });
  return m;
}

export const mapEndpoint: StoreEndpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: answerMap,
};
