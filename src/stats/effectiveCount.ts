/**
 * Kish's effective sample size of a weighted sample: (sum w)^2 / sum w^2, the number of equally
 * weighted cases that would carry the same information (n for equal weights, 1 when one case holds
 * all the weight).
 *
 * Source: Kish (1965), Survey Sampling, Wiley, section 11.7.
 *
 * @example
 * effectiveCount([1, 1, 1, 1]); // => 4
 * effectiveCount([3, 1]); // => 16 / 10 = 1.6
 */
export function effectiveCount(weights: readonly number[]): number {
  let s = 0, s2 = 0;
  for (const w of weights) {
    if (!(w > 0)) continue;
    s += w;
    s2 += w * w;
  }
  return s2 > 0 ? (s * s) / s2 : 0;
}
