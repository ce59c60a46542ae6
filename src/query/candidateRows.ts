import type { GuardedIndex } from '../index/GuardedIndex.ts';
import { partitionVector } from '../index/partitionVector.ts';
import type { PreparedQuery } from './prepareQuery.ts';
import type { QuerySpace } from './QuerySpace.ts';
import { valueAt } from './valueAt.ts';

/** Up to this many rows left out of the pool, the index is searched without a filter callback. */
const UNFILTERED_SEARCH_MAX_EXCLUDED = 64;

/** Every row of the pool, in row order (an exact scan). */
export function poolRows(q: PreparedQuery): number[] {
  const rows: number[] = [];
  for (let i = 0; i < q.group.n; i++) if (q.mask[i] === 1) rows.push(i);
  return rows;
}

/**
 * Up to `c` candidates per index for the exact re-rank: from the index of a learned space's codes, or
 * in the input space from each coverage partition's index (on the dimensions its rows have, so that
 * seasons without tracking are not crowded out by seasons with it; a partition without an index gives
 * all its pool rows).
 */
export function candidateRows(q: PreparedQuery, space: QuerySpace, c: number): number[] {
  const g = q.group;
  if (space) {
    if (!g.index) return poolRows(q);
    return searchPool(q, g.index, Float32Array.from(space.targetCode), c, (label) => label, g.n);
  }
  const sqrtW = Float64Array.from(g.redundancy, Math.sqrt);
  const out: number[] = [];
  for (const p of g.partitions) {
    if (!p.index) {
      for (const r of p.rows) if (q.mask[r] === 1) out.push(r);
      continue;
    }
    const v = new Float32Array(p.dims.length);
    partitionVector(q.target.z, 0, p.dims, sqrtW, v, 0);
    const rows = p.rows;
    for (const r of searchPool(q, p.index, v, c, (label) => valueAt(rows, label), rows.length)) out.push(r);
  }
  return out;
}

/**
 * One index's pool rows near the query vector. When the pool is everyone but a few rows (the
 * target's own seasons), searching without a filter callback and dropping those rows afterwards is
 * several times faster than filtering inside.
 */
function searchPool(q: PreparedQuery, index: GuardedIndex, v: Float32Array, c: number, row: (label: number) => number, size: number): number[] {
  const excluded = q.group.n - q.eligible;
  if (excluded <= UNFILTERED_SEARCH_MAX_EXCLUDED) {
    const hits = index.search(v, Math.min(size, c + excluded));
    return hits.labels.map(row).filter((r) => q.mask[r] === 1);
  }
  return index.search(v, Math.min(size, c), (label) => q.mask[row(label)] === 1).labels.map(row);
}
