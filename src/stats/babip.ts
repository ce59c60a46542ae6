/**
 * Batting average on balls in play (BABIP): how often a ball put in play, other than a home run, falls for a hit.
 *
 * Source: common practice: BABIP = (H - HR) / (AB - SO - HR + SF).
 * Units: a fraction from 0 to 1; higher is better for the batter.
 * Returns NaN when AB - SO - HR + SF is 0.
 *
 * @example
 * babip(150, 20, 500, 100, 5); // => 130 / 385 = 0.33766...
 */
export function babip(H: number, HR: number, AB: number, SO: number, SF: number): number {
  const inPlay = AB - SO - HR + SF;
  return inPlay === 0 ? NaN : (H - HR) / inPlay;
}
