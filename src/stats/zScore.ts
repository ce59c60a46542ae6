/**
 * Standard score (z-score): how many standard deviations a value lies above the mean.
 *
 * Source: common practice: z = (x - mean) / sd.
 * Units: standard deviations; positive above the mean (direction is applied later, in `toGrade`).
 * Returns NaN when sd is 0 (or when any input is NaN).
 *
 * @example
 * zScore(95, 88, 3.5); // => 2
 */
export function zScore(x: number, mean: number, sd: number): number {
  return sd === 0 ? NaN : (x - mean) / sd;
}
