import type { GuardedIndex } from '../ann/GuardedIndex.ts';

/** Up to this many rows left out of the pool, the index is searched without a filter callback. */
export const UNFILTERED_SEARCH_MAX_EXCLUDED = 64;

/**
 * Up to `c` pool rows proposed by an index, closest first: `row` maps an index label to a group row,
 * `mask` marks the pool, `excluded` is how many of the group's rows are outside it. When the pool is
 * everyone but a few rows (the target's own seasons), searching without a filter callback and dropping
 * those rows afterwards is several times faster than filtering inside the native search.
 */
export function searchIndexPool(
  index: GuardedIndex,
  q: Float32Array,
  c: number,
  row: (label: number) => number,
  mask: Uint8Array,
  excluded: number,
): number[] {
  if (excluded <= UNFILTERED_SEARCH_MAX_EXCLUDED) {
    const hits = index.search(q, Math.min(index.count, c + excluded));
    return hits.labels.map(row).filter((r) => mask[r] === 1);
  }
  return index.search(q, Math.min(index.count, c), (label) => mask[row(label)] === 1).labels.map(row);
}
