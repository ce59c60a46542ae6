import { partitionVector } from '../ann/partitionVector.ts';
import type { StoredGroup } from '../store/ProfileStore.ts';
import { PART_INDEX_MIN_SHARE, widerPartitions } from '../ann/narrowRows.ts';
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

/** Candidates are multiplied by this when the target lacks some of a searched partition's dimensions. */
export const PART_PARTIAL_FACTOR = 4;

/** Whether the target has `j` (a weighted dimension with a value). */
const has = (q: CandidateQuery, j: number): boolean => (q.weights[j] as number) > 0 && !Number.isNaN(q.z[j] as number);

/**
 * Searches the narrow index of each partition whose dimensions are exactly the ones the target shares
 * with every wider partition (src/ann/narrowRows.ts: a season without tracking against the tracked
 * ones), adding up to `c` candidates from it to `out`; gives the partitions whose candidates it so
 * proposed, which are then not scanned. Over those rows the target's shared dimensions are the
 * partition's own, so the missing-aware distance ranks them as the index does.
 */
function narrowSearches(
  partitions: StoredGroup['partitions'],
  q: CandidateQuery,
  c: number,
  sqrtW: Float64Array,
  out: number[],
): { served: Set<number>; searched: boolean } {
  const served = new Set<number>();
  let searched = false;
  for (const [i, p] of partitions.entries()) {
    const narrow = p.narrow;
    if (!narrow || !Array.from(p.dims).every((j) => has(q, j))) continue;
    const own = new Set(p.dims);
    const wider = widerPartitions(partitions, i).filter((w) => !served.has(w));
    const exact = wider.every((w) => Array.from(partitions[w]?.dims ?? []).every((j) => own.has(j) || !has(q, j)));
    if (wider.length === 0 || !exact) continue;
    let shared = 0;
    for (const j of p.dims) shared += q.weights[j] as number;
    for (const w of wider) served.add(w);
    if (!(shared > 0) || shared < q.minCoverage * q.targetWeight) continue;
    const index = narrow.index;
    if (!index) {
      for (const w of wider) served.delete(w);
      continue;
    }
    const v = new Float32Array(p.dims.length);
    partitionVector(q.z, 0, p.dims, sqrtW, v, 0);
    const rows = narrow.rows;
    for (const r of searchIndexPool(index, v, c, (label) => rows[label] as number, q.mask, q.excluded)) out.push(r);
    searched = true;
  }
  return { served, searched };
}

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
  const { served, searched } = narrowSearches(g.partitions, q, c, sqrtW, out);
  viaIndex ||= searched;
  for (const [i, p] of g.partitions.entries()) {
    if (served.has(i)) continue;
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
