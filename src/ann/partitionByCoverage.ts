/** Rows that share which dimensions they have, and the dimensions their index is built on. */
export interface CoveragePartition {
  /** Dimensions (column indices) in this partition's vectors: always-present ones plus its pattern. */
  readonly dims: readonly number[];
  /** Rows of the group in this partition, ascending. */
  readonly rows: Int32Array;
}

export interface PartitionOptions {
  /** A dimension missing in at least this share of rows splits the rows by whether they have it. */
  readonly patternShare: number;
}

export const DEFAULT_PARTITION: PartitionOptions = { patternShare: 0.2 };

/**
 * Splits a group's rows by coverage pattern, so that each HNSW index holds rows that have the same
 * dimensions and compares them on those dimensions only. Whole families of measurements are often
 * missing together (no batted-ball tracking before a season or below a level); in one index with
 * missing values set to 0, such rows would look far from a fully tracked target and never be proposed,
 * although the missing-aware distance, which leaves the missing dimensions out, may rank them first.
 * Dimensions missing in fewer than `patternShare` of the rows do not split (they are set to 0 in the
 * index and corrected by the exact re-rank). Partitions are ordered by size, largest first.
 *
 * @example
 * // rows A and B have dims 0..2; row C lacks dim 2 (like a season without tracking):
 * // partitions [{ dims: [0, 1, 2], rows: [A, B] }, { dims: [0, 1], rows: [C] }]
 */
export function partitionByCoverage(
  z: Float32Array | Float64Array,
  n: number,
  d: number,
  options: PartitionOptions = DEFAULT_PARTITION,
): CoveragePartition[] {
  const missing = new Float64Array(d);
  for (let r = 0; r < n; r++) for (let j = 0; j < d; j++) if (Number.isNaN(z[r * d + j] as number)) missing[j] = (missing[j] as number) + 1;
  const always: number[] = [];
  const pattern: number[] = [];
  for (let j = 0; j < d; j++) ((missing[j] as number) >= options.patternShare * n && n > 0 ? pattern : always).push(j);
  const byKey = new Map<string, number[]>();
  for (let r = 0; r < n; r++) {
    let key = '';
    for (const j of pattern) key += Number.isNaN(z[r * d + j] as number) ? '0' : '1';
    const list = byKey.get(key);
    if (list) list.push(r);
    else byKey.set(key, [r]);
  }
  return [...byKey.entries()]
    .map(([key, rows]) => ({
      dims: [...always, ...pattern.filter((_, i) => key[i] === '1')].sort((a, b) => a - b),
      rows: Int32Array.from(rows),
    }))
    .sort((a, b) => b.rows.length - a.rows.length);
}
