/**
 * The p-quantile of values sorted ascending, by linear interpolation between order statistics:
 * h = (n - 1) p, Q = x[floor h] + (h - floor h) (x[floor h + 1] - x[floor h]) (Hyndman and Fan 1996,
 * "Sample quantiles in statistical packages", definition 7, the default of R's quantile()).
 * NaN for an empty list.
 *
 * @example
 * quantileSorted([1, 2, 3, 4], 0.25); // => 1.75 (R: quantile(1:4, 0.25) = 1.75)
 */
export function quantileSorted(sorted: readonly number[], p: number): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  const h = (n - 1) * Math.min(1, Math.max(0, p));
  const lo = Math.floor(h);
  const a = sorted[lo] ?? NaN;
  const b = sorted[Math.min(n - 1, lo + 1)] ?? NaN;
  return a + (h - lo) * (b - a);
}
