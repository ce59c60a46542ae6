/**
 * The vector one profile is indexed (or a target searched) under in a coverage partition: for each of
 * the partition's dimensions, the standardised value times the square root of its weight, a missing
 * value as 0 (its stratum's mean). Squared L2 between two such vectors is the weighted squared distance
 * on those dimensions; the exact re-rank then corrects for anything missing.
 *
 * @example
 * // z = [1, NaN, 2], dims [0, 2], sqrt weights [2, 1, 0.5] -> [2, 1]
 */
export function partitionVector(
  z: Float32Array | Float64Array,
  offset: number,
  dims: ArrayLike<number>,
  sqrtWeights: Float64Array,
  out: Float32Array,
  outOffset: number,
): void {
  for (let k = 0; k < dims.length; k++) {
    const j = dims[k] as number;
    const v = z[offset + j] as number;
    out[outOffset + k] = Number.isNaN(v) ? 0 : v * (sqrtWeights[j] as number);
  }
}
