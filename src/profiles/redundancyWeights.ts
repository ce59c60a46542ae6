/**
 * Redundancy weights: a dimension that measures the same skill as others counts for less, so that a
 * skill seen through many dimensions (power: ISO, HR%, SLG, exit velocity, hard-hit%) does not outvote
 * a skill seen through one (speed).
 *
 * w_i = 1 / sum_j r_ij^2, with r the Pearson correlation of the standardised dimensions over the
 * rows where both are present (pairwise complete), and r_ii = 1. A dimension uncorrelated with all
 * others keeps weight 1; m perfectly correlated copies share weight 1 between them (1/m each).
 * This is the inverse of the dimension's "participation" in the correlation matrix: a project
 * choice, measured against plain z-scores on simulated leagues in bench/comps-quality.
 * Pairs with fewer than `minPairs` shared rows count as uncorrelated.
 *
 * @example
 * // two identical columns and one independent column: weights [0.5, 0.5, 1]
 */
export function redundancyWeights(z: Float64Array, n: number, d: number, minPairs = 30): Float64Array {
  const r = correlationMatrix(z, n, d, minPairs);
  const w = new Float64Array(d);
  for (let i = 0; i < d; i++) {
    let s = 0;
    for (let j = 0; j < d; j++) {
      const v = r[i * d + j] as number;
      s += v * v;
    }
    w[i] = s > 0 ? 1 / s : 1;
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
      let c = 0, sx = 0, sy = 0, sxx = 0, syy = 0, sxy = 0;
      for (let row = 0; row < n; row += step) {
        const x = z[row * d + i] as number;
        const y = z[row * d + j] as number;
        if (Number.isNaN(x) || Number.isNaN(y)) continue;
        c++;
        sx += x;
        sy += y;
        sxx += x * x;
        syy += y * y;
        sxy += x * y;
      }
      let v = 0;
      if (c >= minPairs) {
        const cov = sxy - (sx * sy) / c;
        const vx = sxx - (sx * sx) / c;
        const vy = syy - (sy * sy) / c;
        v = vx > 0 && vy > 0 ? cov / Math.sqrt(vx * vy) : 0;
      }
      r[i * d + j] = v;
      r[j * d + i] = v;
    }
  }
  return r;
}
