/**
 * Batting average (AVG): hits per official at-bat.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * batting average = H / AB.
 * Units: a fraction from 0 to 1 (printed to three decimals); higher is better.
 * Returns NaN when AB is 0.
 *
 * @param H hits
 * @param AB official at-bats
 * @example
 * battingAverage(150, 500); // => 0.3
 */
export function battingAverage(H: number, AB: number): number {
  return AB === 0 ? NaN : H / AB;
}
