import { valueAt } from '../query/valueAt.ts';
import { eligibleRows } from '../query/eligibleRows.ts';
import { missingAwareDistance, targetWeight, type MissingRule } from '../query/missingAwareDistance.ts';
import type { PoolFilter } from '../query/PoolFilter.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';

export interface PoolStanding {
  /** Pool players (other than the candidate) compared. */
  readonly players: number;
  /** Of those, how many are less alike to the target than the candidate (strictly). */
  readonly lessAlike: number;
  /** Of those, how many are more alike (strictly). */
  readonly moreAlike: number;
  /** 100 * lessAlike / players (NaN when the pool is empty). */
  readonly percentile: number;
}

/**
 * Where a candidate's distance to the target ranks in the pool, one row per player as in comps: each
 * pool player (eligible rows, the target's own player left out, coverage at least `minCoverage`) is
 * represented by his closest season; the candidate's player is left out of the count.
 *   percentile = 100 * #{players less alike than the candidate} / #{players}
 * Ties count as neither less nor more alike. A project definition ("the share of the pool he beats").
 * Cost: one pass over the group, O(n d).
 *
 * @example
 * // pool players at distances 1, 2, 3, 4; candidate at 2.5: 2 less alike of 4 => percentile 50, 2 more alike
 */
export function poolPercentile(
  store: ProfileStore,
  g: StoredGroup,
  targetZ: Float64Array,
  targetPlayer: number,
  candidatePlayer: number,
  candidateD2: number,
  weights: Float64Array,
  filter: PoolFilter,
  minCoverage: number,
  missing: MissingRule = 'rescale',
): PoolStanding {
  const wT = targetWeight(targetZ, weights);
  const { mask } = eligibleRows(store, g, filter, new Set(targetPlayer >= 0 ? [targetPlayer, candidatePlayer] : [candidatePlayer]));
  const best = new Map<number, number>();
  for (let i = 0; i < g.n; i++) {
    if (mask[i] !== 1) continue;
    const p = missingAwareDistance(targetZ, g.z, i * g.d, weights, wT, missing);
    if (!(p.coverage >= minCoverage) || !Number.isFinite(p.d2)) continue;
    const player = valueAt(g.player, i);
    const known = best.get(player);
    if (known === undefined || p.d2 < known) best.set(player, p.d2);
  }
  let less = 0;
  let more = 0;
  for (const d2 of best.values()) {
    if (d2 > candidateD2) less++;
    else if (d2 < candidateD2) more++;
  }
  return { players: best.size, lessAlike: less, moreAlike: more, percentile: best.size > 0 ? (100 * less) / best.size : NaN };
}
