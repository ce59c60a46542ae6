/**
 * Interval coverage: the share of true values that fall inside their forecast ranges (ends included).
 * A well-calibrated p10 to p90 range holds the truth about 80% of the time.
 *
 * Source: common practice in forecast verification ("empirical coverage" of a central prediction
 * interval; Gneiting and Raftery (2007), "Strictly proper scoring rules, prediction, and estimation",
 * JASA 102(477), section 6.2).
 * Units: a share, 0 to 1. Triples with a NaN are left out. Returns NaN when none is left.
 *
 * @example
 * intervalCoverage([1, 5, 9], [0, 6, 8], [2, 8, 9]); // => 2 / 3 (5 is below 6)
 */
export function intervalCoverage(truth: readonly number[], low: readonly number[], high: readonly number[]): number {
  if (truth.length !== low.length || truth.length !== high.length) throw new RangeError('intervalCoverage: lengths differ');
  let inside = 0;
  let n = 0;
  for (let i = 0; i < truth.length; i++) {
    const t = truth[i] as number;
    const lo = low[i] as number;
    const hi = high[i] as number;
    if (Number.isNaN(t) || Number.isNaN(lo) || Number.isNaN(hi)) continue;
    n++;
    if (t >= lo && t <= hi) inside++;
  }
  return n === 0 ? NaN : inside / n;
}
