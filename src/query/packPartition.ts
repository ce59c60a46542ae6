/**
 * A coverage partition's values laid out for a scan: its rows' values on its own dimensions, row after
 * row (`values[i * dims.length + k]` is row `rows[i]` on dimension `dims[k]`).
 */
export interface PackedRows {
  /** The group's row of each packed row, ascending. */
  readonly rows: Int32Array;
  /** The group's dimension of each packed column. */
  readonly dims: ArrayLike<number>;
  readonly values: Float32Array;
}

/** A coverage partition as packPartition reads it: its rows (ascending) and dimensions. */
export interface PartitionRows {
  readonly rows: Int32Array;
  readonly dims: ArrayLike<number>;
}

/**
 * The rows of `p` packed on its dimensions, from a group's row-major values `z` (`d` per row). A scan of
 * a small partition over the group's matrix reads rows scattered through it (the tracked seasons of
 * every player), one cache miss or two a row; over the packed copy it reads memory in order.
 *
 * @example
 * // z rows [1, 2, 3], [4, 5, 6], [7, 8, 9]; partition rows [0, 2] on dims [0, 2]:
 * packPartition(z, 3, { rows: Int32Array.of(0, 2), dims: [0, 2] }).values; // => [1, 3, 7, 9]
 */
export function packPartition(z: Float32Array, d: number, p: PartitionRows): PackedRows {
  const m = p.dims.length;
  const values = new Float32Array(p.rows.length * m);
  for (let i = 0; i < p.rows.length; i++) {
    const base = (p.rows[i] as number) * d;
    for (let k = 0; k < m; k++) values[i * m + k] = z[base + (p.dims[k] as number)] as number;
  }
  return { rows: p.rows, dims: p.dims, values };
}

/** Packed copies made so far, one per partition (dropped with its group). */
const PACKED = new WeakMap<PartitionRows, PackedRows>();

/**
 * packPartition made once per partition and kept as long as the partition: a server or a batch scans the
 * same partitions again and again. Costs about one scan to make, and the partition's share of the
 * group's values in memory.
 */
export function packedPartitionOf(z: Float32Array, d: number, p: PartitionRows): PackedRows {
  const kept = PACKED.get(p);
  if (kept) return kept;
  const packed = packPartition(z, d, p);
  PACKED.set(p, packed);
  return packed;
}
