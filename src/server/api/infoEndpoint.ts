import type { PositionGroup } from '../../profiles/positionGroup.ts';
import { WEIGHT_PRESETS } from '../../query/weightPresets.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import { parseParameters } from '../commandParameters.ts';
import type { Endpoint } from '../Endpoint.ts';

/** What the page needs to draw its forms: levels, seasons, group sizes and dimension names, presets. */
export interface StoreInfo {
  readonly generation: number;
  readonly loaded_at: string;
  readonly levels: readonly string[];
  readonly seasons: { readonly from: number | null; readonly to: number | null };
  readonly groups: Readonly<Partial<Record<PositionGroup, { readonly n: number; readonly dims: readonly string[] }>>>;
  readonly presets: readonly string[];
}

/** `GET /api/info`: a summary of the loaded store. */
export function answerInfo(loaded: LoadedStore, query: URLSearchParams): StoreInfo {
  parseParameters(query, { specs: new Map(), extra: [] });
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
  };
}

export const infoEndpoint: Endpoint = {
  methods: ['GET'],
  cacheable: false,
  answer: ({ holder, query }) => answerInfo(holder.current, query),
};
