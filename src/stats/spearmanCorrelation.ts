import { averageRanks } from './averageRanks.ts';

/**
 * Spearman's rank correlation: the Pearson correlation of the two samples' ranks, ties averaged.
 * Used to check whether forecasts put players in the right order, whatever their scale.
 *
 * Source: Spearman (1904), "The proof and measurement of association between two things"; as given in
 * Wikipedia, "Spearman's rank correlation coefficient" (https://en.wikipedia.org/wiki/Spearman%27s_rank_correlation_coefficient):
 * rho = cov(R(x), R(y)) / (sd(R(x)) sd(R(y))); without ties this equals 1 - 6 sum d_i^2 / (n (n^2 - 1)).
 * Units: -1 to 1; 1 when the orders agree, 0 for no association.
 * Pairs with a NaN on either side are left out. Returns NaN for fewer than 2 pairs or a constant side.
 * Cost: O(n log n).
 *
 * @example
 * spearmanCorrelation([1, 2, 3, 4], [10, 30, 20, 40]); // => 1 - 6 * 2 / 60 = 0.8
 */
export function spearmanCorrelation(x: readonly number[], y: readonly number[]): number {
  if (x.length !== y.length) throw new RangeError(`spearmanCorrelation: ${x.length} x values but ${y.length} y values`);
  const xs: number[] = [];
  const ys: number[] = [];
  for (let i = 0; i < x.length; i++) {
    const a = x[i] as number;
    const b = y[i] as number;
    if (!Number.isNaN(a) && !Number.isNaN(b)) {
      xs.push(a);
      ys.push(b);
    }
  }
  const n = xs.length;
  if (n < 2) return NaN;
  const rx = averageRanks(xs);
  const ry = averageRanks(ys);
  const mean = (n + 1) / 2;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = (rx[i] as number) - mean;
    const dy = (ry[i] as number) - mean;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  return sxx === 0 || syy === 0 ? NaN : sxy / Math.sqrt(sxx * syy);
}
