import { QueryError } from '../errors/KindredError.ts';
import { eligibleRows } from './eligibleRows.ts';
import { explainComp } from './explainComp.ts';
import { likeness } from './likeness.ts';
import { missingAwareDistance, targetWeight } from './missingAwareDistance.ts';
import type { PoolFilter } from './PoolFilter.ts';
import type { ProfileStore, StoredGroup } from './ProfileStore.ts';
import type { Target } from './Target.ts';
import type { GuardedIndex } from '../index/GuardedIndex.ts';
import { partitionVector } from '../index/partitionVector.ts';
import type { Comp, CompsResult, QueryEcho } from './types.ts';
import { userWeights, type WeightPreset } from './weightPresets.ts';
import type { StoredEmbedding } from './StoredEmbedding.ts';
import { attributeEmbedded } from './attributeEmbedded.ts';
import { explainEmbeddedComp } from './explainEmbeddedComp.ts';
import { codeDistance2 } from './codeDistance2.ts';
import type { AttributedComp } from './AttributedComp.ts';

export interface CompsOptions {
  readonly k: number;
  /** Skip the index and scan the whole pool. */
  readonly exact: boolean;
  /** Allow several seasons of one comp player (default: each player once, his closest season). */
  readonly allSeasons: boolean;
  readonly filter: PoolFilter;
  readonly preset: WeightPreset;
  readonly weightOverrides: ReadonlyMap<string, number>;
  /** `redundancy` (default) weighs down dimensions that repeat a skill; `plain` gives every dimension 1. */
  readonly weighting: 'redundancy' | 'plain';
  /** Comps must share at least this much of the target's weight (0 to 1). */
  readonly minCoverage: number;
  /**
   * `store` (the default when absent): rank in the store's learned space when the group has one and the
   * weighting is the default (a learned space cannot take per-dimension weights, so other weightings
   * are answered in the input space, and say so in `query.space`); `input`: always the input space.
   */
  readonly space?: 'store' | 'input';
  /** Candidates the index proposes for the exact re-rank (default max(CANDIDATES_MIN, 20 k)). */
  readonly candidates?: number;
  /**
   * In a learned space, attribute each comp's distance to the dimensions (default true). false skips
   * it (same comps and distances; no `attribution` fields, and alike / apart from the input space).
   */
  readonly attributions?: boolean;
}

export const DEFAULT_COMPS_OPTIONS: CompsOptions = {
  k: 10,
  exact: false,
  allSeasons: false,
  filter: {},
  preset: 'balanced',
  weightOverrides: new Map(),
  weighting: 'redundancy',
  minCoverage: 0.5,
};

/** Below this share of the group's weight the target is searched exactly: the index would mislead. */
const INDEX_MIN_TARGET_COVERAGE = 0.75;
/** Fewest candidates the index proposes for the exact re-rank. */
const CANDIDATES_MIN = 200;
/** Up to this many rows left out of the pool, the index is searched without a filter callback. */
const UNFILTERED_SEARCH_MAX_EXCLUDED = 64;
/** A pool this small is scanned exactly: faster than a filtered index search, and exact. */
const INDEX_MIN_POOL = 2000;

interface Scored {
  readonly row: number;
  readonly d2: number;
  readonly coverage: number;
}

/** The weights in play: redundancy (or 1) times the preset and per-dimension multipliers. */
export function effectiveWeights(g: StoredGroup, options: CompsOptions): Float64Array {
  const user = userWeights(g.dims, options.preset, options.weightOverrides);
  return Float64Array.from(user, (u, j) => u * (options.weighting === 'redundancy' ? (g.redundancy[j] as number) : 1));
}

/**
 * Ranked comps for a target: HNSW proposes candidates from the pool (the target's own player is
 * never in it; in the input space each coverage partition's index proposes its own, on the
 * dimensions its rows have, so that seasons without tracking are not crowded out by seasons with it),
 * an exact missing-aware distance orders them, and each comp player appears once,
 * at his closest season, unless `allSeasons`. Falls back to a full scan of the pool when the
 * weighting differs from the one the index was built with, when the target lacks much of the
 * group's dimensions, when the pool is small, or on `exact`.
 *
 * In a store built with a learned space for the group (and the default weighting, see
 * CompsOptions.space), the index holds the codes: candidates come from it (or a scan when the pool is
 * small or on `exact`), the exact re-rank is by the Euclidean distance between codes (codeDistance2),
 * likeness uses the group's pair scale, coverage and the per-dimension breakdown stay in the input
 * space, and each comp's distance is attributed to the dimensions (attributeEmbedded,
 * explainEmbeddedComp). docs/embedding.md has the whole story.
 */
export function findComps(store: ProfileStore, target: Target, options: CompsOptions): CompsResult {
  return findCompsWithRows(store, target, options).result;
}

/** As findComps, also giving each comp's row in the group (same order as result.comps). */
export function findCompsWithRows(
  store: ProfileStore,
  target: Target,
  options: CompsOptions,
): { result: CompsResult; rows: number[] } {
  const g = store.groups.get(target.group);
  if (!g) throw new QueryError('kindred.query.emptyPool', `the store has no ${target.group} profiles`, { group: target.group });
  const weights = effectiveWeights(g, options);
  const exclude = new Set<number>(target.player >= 0 ? [target.player] : []);
  const { mask, count } = eligibleRows(store, g, options.filter, exclude);
  const wT = targetWeight(target.z, weights);
  if (!(wT > 0)) {
    throw new QueryError('kindred.query.badTarget', 'the target has no value on any weighted dimension', { group: target.group });
  }
  const defaultMetric = options.weighting === 'redundancy' && options.preset === 'balanced' && options.weightOverrides.size === 0;
  const groupWeight = weights.reduce((a, b) => a + b, 0);
  const emb = embeddedSpaceOf(g, options, defaultMetric);
  const targetCode = emb ? emb.encode(target.z) : null;
  const useIndex = emb
    ? !options.exact && count >= INDEX_MIN_POOL
    : !options.exact && defaultMetric && !g.embedding && wT / groupWeight >= INDEX_MIN_TARGET_COVERAGE && count >= INDEX_MIN_POOL;

  const score = (row: number): Scored => {
    const p = missingAwareDistance(target.z, g.z, row * g.d, weights, wT);
    if (emb && targetCode) return { row, d2: codeDistance2(targetCode, emb.codes, row * emb.dim), coverage: p.coverage };
    return { row, d2: p.d2, coverage: p.coverage };
  };
  /** Closer first; between equal distances the later season. */
  const before = (a: Scored, b: Scored): number => a.d2 - b.d2 || (g.season[b.row] as number) - (g.season[a.row] as number);
  /** The k best scored rows, each player once (at his closest season) unless allSeasons. */
  const rank = (rows: Iterable<number>): Scored[] => {
    const kept: Scored[] = [];
    const bestOf = new Map<number, number>();
    for (const r of rows) {
      const s = score(r);
      if (!(s.coverage >= options.minCoverage) || !Number.isFinite(s.d2)) continue;
      if (options.allSeasons) {
        kept.push(s);
        continue;
      }
      const p = g.player[r] as number;
      const at = bestOf.get(p);
      if (at === undefined) {
        bestOf.set(p, kept.length);
        kept.push(s);
      } else if (before(s, kept[at] as Scored) < 0) kept[at] = s;
    }
    return topK(kept, options.k, before);
  };

  const sqrtW = Float64Array.from(g.redundancy, Math.sqrt);
  // When the pool is everyone but a few rows (the target's own seasons), searching without a filter
  // callback and dropping those rows afterwards is several times faster than filtering inside.
  const excluded = g.n - count;
  const searchPool = (index: GuardedIndex, q: Float32Array, c: number, row: (label: number) => number, size: number): number[] => {
    if (excluded <= UNFILTERED_SEARCH_MAX_EXCLUDED) {
      const hits = index.search(q, Math.min(size, c + excluded));
      return hits.labels.map(row).filter((r) => mask[r] === 1);
    }
    return index.search(q, Math.min(size, c), (label) => mask[row(label)] === 1).labels.map(row);
  };
  /** Up to `c` candidates per index: from the codes' index, or from each coverage partition. */
  const candidates = (c: number): number[] => {
    if (targetCode) {
      if (!g.index) return allEligible();
      return searchPool(g.index, Float32Array.from(targetCode), c, (label) => label, g.n);
    }
    const out: number[] = [];
    for (const p of g.partitions) {
      if (!p.index) {
        for (const r of p.rows) if (mask[r] === 1) out.push(r);
        continue;
      }
      const q = new Float32Array(p.dims.length);
      partitionVector(target.z, 0, p.dims, sqrtW, q, 0);
      const rows = p.rows;
      for (const r of searchPool(p.index, q, c, (label) => rows[label] as number, rows.length)) out.push(r);
    }
    return out;
  };
  const allEligible = (): number[] => {
    const rows: number[] = [];
    for (let i = 0; i < g.n; i++) if (mask[i] === 1) rows.push(i);
    return rows;
  };

  let ranked: Scored[] = [];
  if (useIndex) {
    let c = Math.min(count, options.candidates ?? Math.max(CANDIDATES_MIN, 20 * options.k));
    for (;;) {
      ranked = rank(candidates(c));
      if (ranked.length >= options.k || c >= count) break;
      c = Math.min(count, c * 4);
    }
  } else {
    ranked = rank(allEligible());
  }

  const comps: Comp[] = ranked.slice(0, options.k).map((s, i) => {
    const inputEx = explainComp(g.dims, weights, target.z, target.raw, g.z, g.raw, s.row * g.d);
    const player = store.players[g.player[s.row] as number];
    const distance = Math.sqrt(s.d2);
    const age = g.age[s.row] as number;
    const attribution = emb && options.attributions !== false ? attributeEmbedded(emb.encode, target.z, Float64Array.from(g.z.subarray(s.row * g.d, (s.row + 1) * g.d)), s.row + 1) : null;
    const ex = emb && attribution ? explainEmbeddedComp(inputEx, attribution, emb.drivers, g.dims) : inputEx;
    const comp: Comp = {
      rank: i + 1,
      player_id: player?.playerId ?? '',
      name: player?.name ?? '',
      season: g.season[s.row] as number,
      level: store.levels[g.level[s.row] as number] ?? '',
      position: g.position[s.row] ?? 'DH',
      age: Number.isNaN(age) ? null : age,
      likeness: round(likeness(distance, emb ? emb.pairScale : wT), 1),
      distance: round(distance, 4),
      coverage: round(s.coverage, 3),
      dimensions: ex.dimensions,
      alike: ex.alike,
      apart: ex.apart,
    };
    if (!attribution) return comp;
    const attributed: AttributedComp = {
      ...comp,
      attribution_total: attribution.total,
      attribution_method: attribution.method,
      attribution_error: attribution.standardError.reduce((a, b) => Math.max(a, b), 0),
    };
    return attributed;
  });

  const result: CompsResult = {
    query: echoTarget(store, g, target, options, useIndex, emb ? emb.space : 'input'),
    pool: {
      group_size: g.n,
      eligible: count,
      filters: filterEcho(options.filter),
      weights: Object.fromEntries(g.dims.map((d, j) => [d.name, round(weights[j] as number, 4)])),
    },
    comps,
  };
  return { result, rows: ranked.slice(0, options.k).map((s) => s.row) };
}

/**
 * The k first items in the given order, without sorting them all: the k-th smallest distance (a native
 * numeric sort of the distances) bounds the few that need the full comparison.
 */
function topK(items: Scored[], k: number, order: (a: Scored, b: Scored) => number): Scored[] {
  if (items.length > 4 * k) {
    const d = Float64Array.from(items, (s) => s.d2).sort();
    const bound = d[k - 1] as number;
    items = items.filter((s) => s.d2 <= bound);
  }
  return items.sort(order).slice(0, k);
}

const round = (x: number, digits: number): number => Number(x.toFixed(digits));

/** The learned space a query is answered in, or null for the input space (see CompsOptions.space). */
export function embeddedSpaceOf(g: StoredGroup, options: CompsOptions, defaultMetric: boolean): StoredEmbedding | null {
  if (!g.embedding || options.space === 'input' || !defaultMetric) return null;
  return g.embedding;
}

function echoTarget(store: ProfileStore, g: StoredGroup, t: Target, options: CompsOptions, usedIndex: boolean, space: QueryEcho['space']): QueryEcho {
  const profile: Record<string, number> = {};
  g.dims.forEach((d, j) => {
    const v = t.raw[j] as number;
    if (!Number.isNaN(v) && !Number.isNaN(t.z[j] as number)) profile[d.name] = Number(v.toFixed(d.digits + 1));
  });
  const player = t.player >= 0 ? store.players[t.player] : undefined;
  return {
    kind: t.kind,
    player_id: player?.playerId ?? null,
    name: player?.name ?? null,
    season: t.season,
    level: t.level,
    position: t.position,
    group: t.group,
    age: t.age,
    profile,
    k: options.k,
    method: usedIndex ? 'hnsw' : 'exact',
    space,
  };
}

function filterEcho(f: PoolFilter): Record<string, string | number | readonly string[]> {
  const out: Record<string, string | number | readonly string[]> = {};
  if (f.levels) out.levels = f.levels;
  if (f.seasonFrom !== undefined) out.season_from = f.seasonFrom;
  if (f.seasonTo !== undefined) out.season_to = f.seasonTo;
  if (f.ageMin !== undefined) out.age_min = f.ageMin;
  if (f.ageMax !== undefined) out.age_max = f.ageMax;
  if (f.bats) out.bats = f.bats;
  if (f.throws) out.throws = f.throws;
  if (f.positions) out.positions = f.positions;
  return out;
}
