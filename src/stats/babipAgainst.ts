/**
 * Batting average on balls in play against a pitcher (BABIP against).
 *
 * Source: common practice approximation from pitching lines (which carry no AB or SF):
 * BABIP against = (H - HR) / (BF - SO - BB - HBP - HR). The denominator counts sacrifice bunts and
 * catcher's interference as balls in play, so it runs a little larger than the batting form
 * AB - SO - HR + SF.
 * Units: a fraction from 0 to 1; lower is better for the pitcher.
 * Returns NaN when BF - SO - BB - HBP - HR is 0.
 *
 * @example
 * babipAgainst(150, 20, 750, 180, 50, 5); // => 130 / 495 = 0.26262...
 */
export function babipAgainst(H: number, HR: number, BF: number, SO: number, BB: number, HBP: number): number {
  const inPlay = BF - SO - BB - HBP - HR;
  return inPlay === 0 ? NaN : (H - HR) / inPlay;
}
