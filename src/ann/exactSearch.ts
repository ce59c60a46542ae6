import { IndexError, UsageError } from '../errors/KindredError.ts';
import { checkVector } from './checkVector.ts';
import type { IndexHits, LabelFilter } from './IndexParams.ts';

/**
 * Exact k nearest neighbours by brute force under squared Euclidean distance,
 * d(x, y) = sum_j (x_j - y_j)^2 (the `l2` space of hnswlib, which omits the square root).
 * The reference for HNSW recall and the engine behind `--exact`. Cost O(n * dim) per query.
 * Ties are broken by the smaller label. Sums are taken in float64 over the float32 rows.
 *
 * @example
 * exactSearch(new Float32Array([0, 0, 1, 0, 3, 4]), 2, [0, 0], 2);
 * // => { labels: [0, 1], distances: [0, 1] }
 */
export function exactSearch(
  vectors: Float32Array,
  dim: number,
  query: ArrayLike<number>,
  k: number,
  filter?: LabelFilter,
): IndexHits {
  if (!Number.isInteger(dim) || dim < 1 || vectors.length % dim !== 0) {
    throw new IndexError('kindred.index.badVector', `rows of ${dim} do not fit ${vectors.length} values`, {
      dim,
      length: vectors.length,
    });
  }
  checkVector(query, dim, 'query');
  checkK(k);
  const count = vectors.length / dim;
  const want = Math.min(k, count);
  if (want === 0) return { labels: [], distances: [] };
  const q = Float64Array.from({ length: dim }, (_, j) => query[j] ?? 0);
  // Sorted top list, closest first; insertion keeps it short (want is small in practice).
  const labels: number[] = [];
  const distances: number[] = [];
  for (let i = 0; i < count; i++) {
    if (filter && !filter(i)) continue;
    let d = 0;
    const base = i * dim;
    for (let j = 0; j < dim; j++) {
      const diff = (vectors[base + j] ?? 0) - (q[j] ?? 0);
      d += diff * diff;
    }
    if (!Number.isFinite(d)) {
      throw new IndexError('kindred.index.badVector', `row ${i} holds a non-finite value (expected finite numbers)`, {
        row: i,
      });
    }
    if (labels.length === want && d >= (distances[want - 1] ?? Infinity)) continue;
    let at = labels.length;
    while (at > 0 && (distances[at - 1] ?? 0) > d) at--;
    labels.splice(at, 0, i);
    distances.splice(at, 0, d);
    if (labels.length > want) {
      labels.pop();
      distances.pop();
    }
  }
  return { labels, distances };
}

/** k must be a non-negative integer; it is clamped to the row count by the caller. */
export function checkK(k: number): void {
  if (!Number.isInteger(k) || k < 0) {
    throw new UsageError(`k is ${k} (expected an integer >= 0)`, { k });
  }
}
