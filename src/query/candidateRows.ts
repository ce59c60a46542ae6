import { partitionCandidates } from './partitionCandidates.ts';
import { searchIndexPool } from './searchIndexPool.ts';
import type { PreparedQuery } from './prepareQuery.ts';
import type { QuerySpace } from './QuerySpace.ts';

/** Every row of the pool, in row order (an exact scan). */
export function poolRows(q: PreparedQuery): number[] {
  const rows: number[] = [];
  for (let i = 0; i < q.group.n; i++) if (q.mask[i] === 1) rows.push(i);
  return rows;
}

/**
 * Up to `c` candidates per index for the exact re-rank: from the index of a learned space's codes, or
 * in the input space from every coverage partition (partitionCandidates: its index when the target
 * has the partition's dimensions, a scan on the shared ones otherwise; a partition none of whose rows
 * can reach `minCoverage` proposes nothing). `viaIndex` tells whether an index was searched.
 */
export function candidateRows(q: PreparedQuery, space: QuerySpace, c: number, minCoverage: number): { rows: number[]; viaIndex: boolean } {
  const g = q.group;
  const excluded = g.n - q.eligible;
  if (space) {
    if (!g.index) return { rows: poolRows(q), viaIndex: false };
    return { rows: searchIndexPool(g.index, Float32Array.from(space.targetCode), c, (label) => label, q.mask, excluded), viaIndex: true };
  }
  return partitionCandidates(g, { z: q.target.z, weights: q.weights, targetWeight: q.targetWeight, minCoverage, mask: q.mask, excluded }, c);
}
