import type { ProfileStore } from '../store/ProfileStore.ts';
import type { Target } from './Target.ts';
import type { CompsResult } from './CompsResult.ts';
import { prepareQuery, type PreparedQuery, type QuerySettings } from './prepareQuery.ts';
import { querySpace, type QuerySpace } from './QuerySpace.ts';
import { scoreRows, type ScoredRow } from './scoreRow.ts';
import { rankScored } from './rankScored.ts';
import { candidateRows, poolRows } from './candidateRows.ts';
import { describeComp } from './describeComp.ts';
import { echoPool, echoQuery } from './echoQuery.ts';

export interface CompsOptions extends QuerySettings {
  readonly k: number;
  /** Skip the index and scan the whole pool. */
  readonly exact: boolean;
  /** Allow several seasons of one comp player (default: each player once, his closest season). */
  readonly allSeasons: boolean;
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

/** Fewest candidates the index proposes for the exact re-rank. */
const CANDIDATES_MIN = 200;
/** A pool this small is scanned exactly: faster than a filtered index search, and exact. */
const INDEX_MIN_POOL = 2000;

/**
 * Ranked comps for a target: candidates come from the pool (the target's own player is never in it;
 * in the input space from every coverage partition, by its index when the target has the partition's
 * dimensions, by a scan on the shared dimensions when it has only part of them, see
 * partitionCandidates), an exact missing-aware distance orders them, and each comp player appears
 * once, at his closest season, unless `allSeasons`. Falls back to a full scan of the pool when the
 * weighting differs from the one the indexes were built with, when the pool is small, or on `exact`.
 * `query.method` is `hnsw` when an index was searched.
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
export function findCompsWithRows(store: ProfileStore, target: Target, options: CompsOptions): { result: CompsResult; rows: number[] } {
  return compsOf(prepareQuery(store, target, options), options);
}

/** What a comps answer says when the store's learned space could not take the weights asked for. */
export const LEARNED_SPACE_NOTE = 'the store\u2019s learned space takes only the default weights, not these';

/** The comps of a prepared query (findComps after prepareQuery): search, rank, describe, echo. */
export function compsOf(q: PreparedQuery, options: CompsOptions): { result: CompsResult; rows: number[] } {
  const space = querySpace(q, options.space);
  const { ranked, usedIndex } = searchRanked(q, space, options);
  const comps = ranked.map((s, i) => describeComp(q, s, i + 1, { space, attributions: options.attributions !== false }));
  const result: CompsResult = {
    query: {
      ...echoQuery(q, options.k, usedIndex ? 'hnsw' : 'exact', space ? space.embedding.space : 'input'),
      ...(!space && q.group.embedding && options.space !== 'input' ? { space_note: LEARNED_SPACE_NOTE } : {}),
    },
    pool: echoPool(q),
    comps,
  };
  return { result, rows: ranked.map((s) => s.row) };
}

/**
 * The k best pool rows: from the index's candidates, asking for more until k comps pass the
 * coverage floor, or from a scan of the whole pool (see findComps for when each is used).
 */
export function searchRanked(q: PreparedQuery, space: QuerySpace, options: CompsOptions): { ranked: ScoredRow[]; usedIndex: boolean } {
  const g = q.group;
  const wanted = { k: options.k, allSeasons: options.allSeasons, minCoverage: options.minCoverage };
  const score = (rows: readonly number[]): ScoredRow[] => scoreRows(q, rows, space);
  const indexed = space ? !options.exact && q.eligible >= INDEX_MIN_POOL : !options.exact && q.defaultMetric && !g.embedding && q.eligible >= INDEX_MIN_POOL;
  if (!indexed) return { ranked: rankScored(g, score(poolRows(q)), wanted), usedIndex: false };
  let c = Math.min(q.eligible, options.candidates ?? Math.max(CANDIDATES_MIN, 20 * options.k));
  let usedIndex = false;
  for (;;) {
    const found = candidateRows(q, space, c, options.minCoverage);
    usedIndex ||= found.viaIndex;
    const ranked = rankScored(g, score(found.rows), wanted);
    if (ranked.length >= options.k || c >= q.eligible) return { ranked, usedIndex };
    c = Math.min(q.eligible, c * 4);
  }
}
