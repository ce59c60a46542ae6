import type { PositionGroup } from '../../profiles/positionGroup.ts';
import { WEIGHT_PRESETS } from '../../query/weightPresets.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import type { PoolReachDefaults, ReachJob, StoreInfo } from '../../request/apiContract.ts';
import { noParameters } from '../../request/readRequest.ts';
import { defaultOf } from '../../request/parameters.ts';

export type { StoreInfo } from '../../request/apiContract.ts';
import type { StoreEndpoint } from '../Endpoint.ts';

/** A reach in JSON: a whole number, or null for no limit (the parameter's `all`). */
const limit = (n: number | undefined): number | null => (n === undefined || !Number.isFinite(n) ? null : n);

/** A job's default pool reach as the request table gives it. */
function reachOf(job: ReachJob): PoolReachDefaults {
  return {
    adjacent: defaultOf('adjacent', job) ?? false,
    level_span: limit(defaultOf('levelSpan', job)),
    sample_floor: defaultOf('sampleFloor', job) ?? 0,
    recent: limit(defaultOf('recent', job)),
  };
}

/** `GET /api/info`: a summary of the loaded store. */
export function answerInfo(loaded: LoadedStore, query: URLSearchParams): StoreInfo {
  noParameters(query);
  const s = loaded.store;
  let from: number | null = null;
  let to: number | null = null;
  const groups: Partial<Record<PositionGroup, { n: number; dims: string[] }>> = {};
  for (const [name, g] of s.groups) {
    groups[name] = { n: g.n, dims: g.dims.map((d) => d.name) };
    for (const season of g.season) {
      if (from === null || season < from) from = season;
      if (to === null || season > to) to = season;
    }
  }
  return {
    generation: loaded.generation,
    loaded_at: loaded.loadedAt.toISOString(),
    levels: s.levels,
    seasons: { from, to },
    groups,
    presets: Object.keys(WEIGHT_PRESETS),
    min_coverage: {
      comps: defaultOf('minCoverage', 'comps') ?? 0,
      prospect: defaultOf('minCoverage', 'prospect') ?? 0,
      cheaper: defaultOf('minCoverage', 'cheaper') ?? 0,
      match: defaultOf('minCoverage', 'match') ?? 0,
    },
    pool_reach: { comps: reachOf('comps'), cheaper: reachOf('cheaper'), match: reachOf('match') },
  };
}

/** A store endpoint: the summary is fixed per loaded store (its generation and load time included), so it is cached and computed with the answers. */
export const infoEndpoint: StoreEndpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: answerInfo,
};
