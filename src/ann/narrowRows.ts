/** A coverage partition as narrowRows reads it: its dimensions and its rows (ascending). */
export interface PartitionShape {
  readonly dims: ArrayLike<number>;
  readonly rows: ArrayLike<number>;
}

/**
 * When a partition gets a narrow index: its wider partitions hold at least `rows` rows (fewer are
 * scanned about as fast as an index is searched), and it holds at least `targets` rows itself (a
 * rarer coverage's few targets scan, rather than every build paying for an index they seldom use).
 */
export interface NarrowIndexMin {
  readonly rows: number;
  readonly targets: number;
}

export const NARROW_INDEX_MIN: NarrowIndexMin = { rows: 5000, targets: 1000 };

/**
 * The partitions whose dimensions strictly include those of partition `i`: their rows have every
 * dimension `i` has, and more.
 *
 * @example
 * // dims [0, 1], [0, 1, 2], [0, 2]: widerPartitions(parts, 0) -> [1]
 */
export function widerPartitions(partitions: readonly PartitionShape[], i: number): number[] {
  const own = partitions[i];
  if (!own) return [];
  const mine = Array.from(own.dims);
  const out: number[] = [];
  for (const [j, p] of partitions.entries()) {
    if (j === i || p.dims.length <= mine.length) continue;
    const theirs = new Set(Array.from(p.dims));
    if (mine.every((d) => theirs.has(d))) out.push(j);
  }
  return out;
}

/**
 * A partition's index is searched when the target has at least this share of the partition's weight
 * (its missing coordinates set to 0, the stratum mean); below it the partition is scanned on the
 * dimensions it shares with the target (or, for a target of a partition with a narrow index, searched
 * in that). Chosen by recall and time on simulated leagues (bench core).
 */
export const PART_INDEX_MIN_SHARE = 0.9;

/**
 * Whether a target with exactly partition `i`'s dimensions would scan a wider partition (it holds less
 * than PART_INDEX_MIN_SHARE of that partition's default weight): only then is a narrow index worth
 * its build.
 *
 * @example
 * // dims [0, 1] and [0, 1, 2], weights [1, 1, 1]: 2/3 < 0.9 -> true; weights [1, 1, 0.1]: 2/2.1 -> false
 */
export function scansWider(partitions: readonly PartitionShape[], i: number, weights: ArrayLike<number>): boolean {
  const weightOf = (dims: ArrayLike<number>): number => Array.from(dims).reduce((a, j) => a + (weights[j] ?? 0), 0);
  const own = weightOf(partitions[i]?.dims ?? []);
  return widerPartitions(partitions, i).some((j) => own < PART_INDEX_MIN_SHARE * weightOf(partitions[j]?.dims ?? []));
}

/**
 * The rows of a partition's narrow index, ascending: every row of the wider partitions
 * (widerPartitions). The index holds them on partition `i`'s dimensions only. A target that has
 * exactly those dimensions of theirs (a season without tracking, against the tracked seasons) is
 * then compared with them on what both have by one index search instead of a scan of each wider
 * partition: the missing-aware distance over rows that all have the target's dimensions is the
 * weighted Euclidean distance on them. Nothing is stored for these rows; they follow from the
 * partitions.
 *
 * @example
 * // partitions { dims [0, 1], rows [0, 3] }, { dims [0, 1, 2], rows [1, 4] }, { dims [0, 1, 3], rows [2] }:
 * narrowRows(parts, 0); // => Int32Array [1, 2, 4]
 */
export function narrowRows(partitions: readonly PartitionShape[], i: number): Int32Array {
  const rows: number[] = [];
  for (const j of widerPartitions(partitions, i)) {
    const p = partitions[j];
    if (p) for (let k = 0; k < p.rows.length; k++) rows.push(p.rows[k] as number);
  }
  return Int32Array.from(rows).sort();
}
