/**
 * The vector a profile is indexed under: each standardised value times the square root of its weight,
 * a missing value as 0 (its stratum's mean). Squared L2 between two such vectors is the weighted squared
 * distance over all dimensions; the exact re-rank then corrects for missing dimensions.
 */
export function indexVector(z: Float32Array | Float64Array, offset: number, sqrtWeights: Float64Array, out: Float32Array, outOffset: number): void {
  const d = sqrtWeights.length;
  for (let j = 0; j < d; j++) {
    const v = z[offset + j] as number;
    out[outOffset + j] = Number.isNaN(v) ? 0 : v * (sqrtWeights[j] as number);
  }
}
