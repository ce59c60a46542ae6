/**
 * On-base percentage (OBP): how often a batter reaches base by hit, walk or hit-by-pitch.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * OBP = (H + BB + HBP) / (AB + BB + HBP + SF). Reaching on error, interference or a fielder's
 * choice does not count; sacrifice bunts are not in the denominator.
 * Units: a fraction from 0 to 1; higher is better.
 * Returns NaN when AB + BB + HBP + SF is 0.
 *
 * @example
 * onBasePercentage(150, 60, 5, 500, 5); // => 215 / 570 = 0.37719...
 */
export function onBasePercentage(H: number, BB: number, HBP: number, AB: number, SF: number): number {
  const chances = AB + BB + HBP + SF;
  return chances === 0 ? NaN : (H + BB + HBP) / chances;
}
