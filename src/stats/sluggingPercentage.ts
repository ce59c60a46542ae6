/**
 * Slugging percentage (SLG): total bases per official at-bat.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * SLG = TB / AB. Compute TB with `totalBases`.
 * Units: bases per at-bat, from 0 to 4; higher is better.
 * Returns NaN when AB is 0.
 *
 * @param TB total bases
 * @param AB official at-bats
 * @example
 * sluggingPercentage(246, 500); // => 0.492
 */
export function sluggingPercentage(TB: number, AB: number): number {
  return AB === 0 ? NaN : TB / AB;
}
