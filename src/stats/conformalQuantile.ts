/**
 * Split conformal prediction: the score quantile that turns held-out residuals into an interval with
 * a stated coverage.
 *
 * Source: Lei, G'Sell, Rinaldo, Tibshirani and Wasserman (2018), "Distribution-free predictive
 * inference for regression", JASA 113(523), algorithm 2 (split conformal): with n calibration scores
 * sorted increasingly, the interval holds a new case with probability at least 1 - alpha when widened by
 * the k-th smallest score, k = ceil((n + 1)(1 - alpha)); when k > n no finite width guarantees it.
 * The score used here is that of conformalized quantile regression, Romano, Patterson and Candes (2019),
 * "Conformalized quantile regression", NeurIPS: e = max(lo - y, y - hi) for a forecast range [lo, hi],
 * and the adjusted range is [lo - q, hi + q].
 *
 * @example
 * conformalIndex(19, 0.2); // => ceil(20 * 0.8) = 16
 * conformalQuantile([5, 1, 4, 2, 3], 0.5); // => 3rd smallest of 5 (k = ceil(6 * 0.5) = 3) = 3
 */
export function conformalIndex(n: number, alpha: number): number {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`conformalIndex: n ${n}: expected a whole number`);
  if (!(alpha > 0 && alpha < 1)) throw new RangeError(`conformalIndex: alpha ${alpha}: expected 0 < alpha < 1`);
  return Math.ceil((n + 1) * (1 - alpha) - 1e-9);
}

/** The k-th smallest score, k = conformalIndex(n, alpha); Infinity when k > n (too few scores). NaN scores are left out. */
export function conformalQuantile(scores: readonly number[], alpha: number): number {
  const sorted = scores.filter((s) => !Number.isNaN(s)).sort((a, b) => a - b);
  const k = conformalIndex(sorted.length, alpha);
  return k > sorted.length ? Infinity : (sorted[Math.max(0, k - 1)] as number);
}

/** The conformalized-quantile-regression score of one case: how far y falls outside [lo, hi] (negative inside). */
export function rangeScore(y: number, lo: number, hi: number): number {
  return Math.max(lo - y, y - hi);
}
