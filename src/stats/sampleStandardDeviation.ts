import { mean } from './mean.ts';

/**
 * Sample standard deviation of the finite values of a list (NaN, Infinity and -Infinity skipped as
 * missing), with Bessel's correction (divide by n - 1).
 *
 * Source: common practice: s = sqrt(sum((x - mean)^2) / (n - 1)); two passes (mean, then squared
 * deviations) to avoid the cancellation of the one-pass sum-of-squares form. Cost O(n).
 * Units: those of the values. Returns NaN when fewer than two finite values are present.
 *
 * @example
 * sampleStandardDeviation([2, 4, 4, 4, 5, 5, 7, 9]); // => sqrt(32 / 7) = 2.13809...
 */
export function sampleStandardDeviation(values: readonly number[]): number {
  const m = mean(values);
  let squares = 0;
  let count = 0;
  for (const v of values) {
    if (Number.isFinite(v)) {
      squares += (v - m) * (v - m);
      count += 1;
    }
  }
  const besselsCorrection = count - 1;
  return besselsCorrection < 1 ? NaN : Math.sqrt(squares / besselsCorrection);
}
