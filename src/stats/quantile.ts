/**
 * Kindred's quantiles, one module: of a sorted sample by interpolation (Hyndman and Fan definition 7)
 * or by nearest rank (definition 1), and of a weighted sample by the midpoint rule (definition 5 when
 * the weights are equal).
 */

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

/**
 * The p-quantile of values sorted ascending by the nearest-rank method: the value at rank
 * ceil(p n), at least the first (Hyndman and Fan 1996, definition 1; common practice for latency
 * percentiles). NaN for an empty list.
 *
 * @example
 * nearestRankQuantile([1, 2, 3, 4], 0.5); // => 2 (rank ceil(2) = 2)
 * nearestRankQuantile([1, 2, 3, 4], 0.99); // => 4 (rank ceil(3.96) = 4)
 */
export function nearestRankQuantile(sorted: readonly number[], p: number): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  return sorted[Math.min(n - 1, Math.max(0, Math.ceil(p * n) - 1))] ?? NaN;
}

/**
 * Weighted quantile by the midpoint rule: what value a share `p` of the total weight lies below.
 *
 * Source: the weighted percentile method of Wikipedia, "Percentile", section "The weighted percentile
 * method" (https://en.wikipedia.org/wiki/Percentile): with the values sorted ascending, weights w_i,
 * cumulative weights S_i and total S_N, each value sits at the position
 *   p_i = (S_i - w_i / 2) / S_N,
 * and the quantile at p is read by linear interpolation between the neighbouring positions, held at
 * the first value below p_1 and at the last value above p_N. With equal weights p_i = (i - 1/2) / N,
 * which is definition 5 of Hyndman and Fan (1996), "Sample quantiles in statistical packages",
 * The American Statistician 50(4) (R's `quantile(x, type = 5)`).
 * Values with a weight of 0 (or less, or not finite) and values that are NaN are left out.
 * Cost: O(n log n) for the sort.
 * Returns NaN when nothing is left, or when p is outside 0 to 1.
 *
 * @example
 * weightedQuantile([10, 20, 30], [1, 2, 1], 0.5); // => 20 (positions .125, .5, .875)
 * weightedQuantile([10, 20, 30], [1, 2, 1], 0.3); // => 10 + (0.3 - 0.125) / 0.375 * 10 = 14.666...
 */
export function weightedQuantile(values: readonly number[], weights: readonly number[], p: number): number {
  return weightedQuantiles(values, weights, [p])[0] ?? NaN;
}

/** Several quantiles of one weighted sample (one sort). */
export function weightedQuantiles(values: readonly number[], weights: readonly number[], ps: readonly number[]): number[] {
  if (values.length !== weights.length) throw new RangeError(`weightedQuantiles: ${values.length} values but ${weights.length} weights`);
  const items: { x: number; w: number }[] = [];
  for (let i = 0; i < values.length; i++) {
    const x = values[i] ?? NaN;
    const w = weights[i] ?? NaN;
    if (!Number.isNaN(x) && Number.isFinite(w) && w > 0) items.push({ x, w });
  }
  items.sort((a, b) => a.x - b.x);
  const total = items.reduce((s, it) => s + it.w, 0);
  const positions: number[] = [];
  let cumulative = 0;
  for (const it of items) {
    cumulative += it.w;
    positions.push((cumulative - it.w / 2) / total);
  }
  return ps.map((p) => {
    if (items.length === 0 || !(p >= 0 && p <= 1)) return NaN;
    const at = (i: number): number => items[i]?.x ?? NaN;
    const position = (i: number): number => positions[i] ?? NaN;
    if (p <= position(0)) return at(0);
    if (p >= position(positions.length - 1)) return at(items.length - 1);
    let hi = 1;
    while (position(hi) < p) hi++;
    const p0 = position(hi - 1);
    const p1 = position(hi);
    const x0 = at(hi - 1);
    const x1 = at(hi);
    return p1 === p0 ? x1 : x0 + ((p - p0) / (p1 - p0)) * (x1 - x0);
  });
}
