import { QueryError, UsageError } from '../../errors/KindredError.ts';
import { POSITION_GROUPS, type PositionGroup } from '../../profiles/positionGroup.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import type { PoolMap } from '../poolMap.ts';
import { parseParameters, type ParameterSet } from '../commandParameters.ts';
import type { Endpoint } from '../Endpoint.ts';

function positionGroup(value: string): PositionGroup {
  const v = value.trim().toUpperCase();
  const g = POSITION_GROUPS.find((x) => x === v);
  if (g === undefined) throw new UsageError(`expected a position group (${POSITION_GROUPS.join(', ')}), got "${value}"`, { value });
  return g;
}

const MAP_PARAMETERS: ParameterSet = {
  specs: new Map([['group', { name: 'group', attribute: 'group', flag: false, parse: positionGroup, defaultValue: undefined }]]),
  extra: [],
};

/** `GET /api/map?group=G`: the pool of a position group on its first two principal components (cached per store). */
export function answerMap(loaded: LoadedStore, query: URLSearchParams): PoolMap {
  const { options } = parseParameters(query, MAP_PARAMETERS);
  const group = options.group;
  if (typeof group !== 'string') throw new UsageError(`parameter group is required (${POSITION_GROUPS.join(', ')})`, { parameter: 'group' });
  const m = loaded.map(positionGroup(group));
  if (!m) throw new QueryError('kindred.query.emptyPool', `the store has no ${group} profiles`, { group });
  return m;
}

export const mapEndpoint: Endpoint = {
  methods: ['GET'],
  cacheable: false,
  answer: ({ holder, query }) => answerMap(holder.current, query),
};
