import { partitionVector } from '../ann/partitionVector.ts';
import type { StoredGroup } from '../store/ProfileStore.ts';
import { closestRows } from './closestRows.ts';
import { packedPartitionOf } from './packPartition.ts';
import { searchIndexPool } from './searchIndexPool.ts';

/** What the candidates of one input-space query are drawn for. */
export interface CandidateQuery {
  /** The target's standardised values (NaN: missing). */
  readonly z: Float64Array;
  /** The weights in play (the index weights: candidates come from an index only with these). */
  readonly weights: Float64Array;
  /** Total weight of the target's dimensions (W_T). */
  readonly targetWeight: number;
  readonly minCoverage: number;
  /** The pool over the group's rows, and how many rows are outside it. */
  readonly mask: Uint8Array;
  readonly excluded: number;
}

/**
 * A partition's index is searched when the target has at least this share of the partition's weight
 * (its missing coordinates set to 0, the stratum mean); below it the partition is scanned on the
 * dimensions it shares with the target. Chosen by recall and time on simulated leagues (bench core).
 */
export const PART_INDEX_MIN_SHARE = 0.9;
/** Candidates are multiplied by this when the target lacks some of a searched partition's dimensions. */
export const PART_PARTIAL_FACTOR = 4;

/**
 * Candidates from every coverage partition of a group (input space): each partition proposes up to
 * `c` rows by its own measure. A partition whose dimensions the target (nearly) all has is searched in
 * its HNSW index; one the target shares only part of (a season without tracking against tracked
 * seasons, a `--want` profile of a few dimensions), or one without an index, is scanned exactly on the
 * shared dimensions (closestRows), so every target's candidates are the closest by the missing-aware
 * distance, and the exact re-rank orders them. A partition none of whose rows can reach `minCoverage`
 * proposes nothing. `viaIndex` tells whether any index was searched.
 */
export function partitionCandidates(g: Pick<StoredGroup, 'z' | 'd' | 'partitions'>, q: CandidateQuery, c: number): { rows: number[]; viaIndex: boolean } {
  const out: number[] = [];
  let viaIndex = false;
  const sqrtW = Float64Array.from(q.weights, Math.sqrt);
  for (const p of g.partitions) {
    let partWeight = 0;
    let sharedWeight = 0;
    for (const j of p.dims) {
      const w = q.weights[j] as number;
      partWeight += w;
      if (!Number.isNaN(q.z[j] as number)) sharedWeight += w;
    }
    if (!(sharedWeight > 0) || sharedWeight < q.minCoverage * q.targetWeight) continue;
    if (p.index && sharedWeight >= PART_INDEX_MIN_SHARE * partWeight) {
      const v = new Float32Array(p.dims.length);
      partitionVector(q.z, 0, p.dims, sqrtW, v, 0);
      const rows = p.rows;
      const want = sharedWeight < partWeight ? c * PART_PARTIAL_FACTOR : c;
      for (const r of searchIndexPool(p.index, v, want, (label) => rows[label] as number, q.mask, q.excluded)) out.push(r);
      viaIndex = true;
      continue;
    }
    for (const r of closestRows(q.z, packedPartitionOf(g.z, g.d, p), q.mask, q.weights, q.targetWeight, q.minCoverage, c)) out.push(r);
  }
  return { rows: out, viaIndex };
}
