import type { StoredGroup } from '../store/ProfileStore.ts';
import { quantileSorted } from '../stats/quantile.ts';

/** How a dimension of a stored group was regressed: the median fitted k over the strata that were fitted. */
export interface ShrinkageSummary {
  /** Median fitted k over fitted strata; NaN when none was fitted. */
  readonly fittedK: number;
  readonly fittedStrata: number;
  readonly strata: number;
}

/**
 * Summary of the k a store's rates were regressed with, for `kindred dims`: of every league stratum
 * (season and level, plus position) the group's lines fall in, how many had k fitted, and their median k.
 *
 * @example
 * fittedShrinkage(store.groups.get('IF'), 'k_pct'); // => { fittedK: 71.3, fittedStrata: 140, strata: 144 }
 */
export function fittedShrinkage(group: StoredGroup, dim: string): ShrinkageSummary {
  const strata = [...(group.shrinkage.get(dim)?.values() ?? [])];
  const fitted = strata.filter((s) => s.source === 'fitted').map((s) => s.k).sort((a, b) => a - b);
  return { fittedK: fitted.length > 0 ? quantileSorted(fitted, 0.5) : NaN, fittedStrata: fitted.length, strata: strata.length };
}
