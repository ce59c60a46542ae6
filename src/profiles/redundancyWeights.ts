import { PearsonSums } from '../stats/PearsonSums.ts';

/**
 * Dimension weights that count each lasting skill about once:
 *
 *   w_i = rel_i^2 / sum_j rho'_ij^2,   rho'_ij = min(1, |r_ij| / sqrt(rel_i rel_j)),  rho'_ii = 1
 *
 * - rel_i is the dimension's season-to-season reliability (see reliability.ts): a dimension that is
 *   mostly sampling noise (BABIP, fielding percentage) counts for little.
 * - rho' is the correlation corrected for attenuation (Spearman 1904): how much two dimensions measure
 *   the same skill once their noise is set aside. A skill seen through many dimensions (power: ISO,
 *   HR%, SLG, exit velocity, hard-hit%) shares its weight among them instead of outvoting a skill seen
 *   through one (speed). Without the correction, noise (uncorrelated with everything) would look like
 *   a unique skill and be weighted up.
 * r is the pairwise-complete Pearson correlation of the standardised dimensions; pairs with fewer than
 * `minPairs` shared rows count as unrelated.
 * With `family` (a family number per dimension), only dimensions of the same family count as
 * redundant with each other: the weighting then acts within each skill family (see familyWeights.ts).
 * A project choice, measured against plain z-scores on simulated leagues (bench/compsQuality.bench.ts).
 *
 * @example
 * // two identical, perfectly reliable columns and an unrelated one: weights [0.5, 0.5, 1]
 */
export function redundancyWeights(
  z: Float64Array,
  n: number,
  d: number,
  rel: Float64Array = new Float64Array(d).fill(1),
  minPairs = 30,
  family?: ArrayLike<number>,
): Float64Array {
  const r = correlationMatrix(z, n, d, minPairs);
  const w = new Float64Array(d);
  for (let i = 0; i < d; i++) {
    const ri = rel[i] as number;
    let s = 0;
    for (let j = 0; j < d; j++) {
      if (family && family[i] !== family[j]) continue;
      const v = i === j ? 1 : Math.min(1, Math.abs(r[i * d + j] as number) / Math.sqrt(ri * (rel[j] as number)));
      s += v * v;
    }
    w[i] = (ri * ri) / s;
  }
  return w;
}

/**
 * Pairwise-complete Pearson correlation matrix (d x d, row-major) of a row-major n x d matrix with NaN
 * for missing values. Uses at most 200,000 evenly spaced rows (enough for two decimals).
 */
export function correlationMatrix(z: Float64Array, n: number, d: number, minPairs = 30): Float64Array {
  const step = Math.max(1, Math.floor(n / 200_000));
  const r = new Float64Array(d * d);
  for (let i = 0; i < d; i++) {
    r[i * d + i] = 1;
    for (let j = i + 1; j < d; j++) {
      const sums = new PearsonSums();
      for (let row = 0; row < n; row += step) {
        const x = z[row * d + i] as number;
        const y = z[row * d + j] as number;
        if (!Number.isNaN(x) && !Number.isNaN(y)) sums.add(x, y);
      }
      const rho = sums.correlation();
      const v = sums.n >= minPairs && !Number.isNaN(rho) ? rho : 0;
      r[i * d + j] = v;
      r[j * d + i] = v;
    }
  }
  return r;
}
