/**
 * Arithmetic mean of the finite values of a list; NaN, Infinity and -Infinity are skipped as missing.
 *
 * Source: common practice (sum / count). Summed in one pass; cost O(n).
 * Units: those of the values. Returns NaN when no finite value is present.
 *
 * @example
 * mean([1, 2, NaN, 6]); // => 3
 */
export function mean(values: readonly number[]): number {
  let sum = 0;
  let count = 0;
  for (const v of values) {
    if (Number.isFinite(v)) {
      sum += v;
      count += 1;
    }
  }
  return count === 0 ? NaN : sum / count;
}
