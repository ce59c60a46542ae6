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
    const x = values[i] as number;
    const w = weights[i] as number;
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
    const first = items[0] as { x: number };
    const last = items[items.length - 1] as { x: number };
    if (p <= (positions[0] as number)) return first.x;
    if (p >= (positions[positions.length - 1] as number)) return last.x;
    let hi = 1;
    while ((positions[hi] as number) < p) hi++;
    const p0 = positions[hi - 1] as number;
    const p1 = positions[hi] as number;
    const x0 = (items[hi - 1] as { x: number }).x;
    const x1 = (items[hi] as { x: number }).x;
    return p1 === p0 ? x1 : x0 + ((p - p0) / (p1 - p0)) * (x1 - x0);
  });
}
