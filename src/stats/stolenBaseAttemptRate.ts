/**
 * Stolen-base attempt rate: steal attempts per time reaching first base.
 *
 * Source: common practice approximation: attempts / (1B + BB + HBP), taking singles, walks and
 * hit-by-pitches as the times on first that give a chance to steal (reaching on error or a
 * fielder's choice is not counted; steals of third and home count as attempts).
 * Units: attempts per opportunity, usually 0 to 1 (can exceed 1 for runners who steal twice);
 * higher means more aggressive (neither better nor worse by itself).
 * Returns NaN when 1B + BB + HBP is 0.
 *
 * @param singles singles (H - 2B - 3B - HR)
 * @example
 * stolenBaseAttemptRate(30, 10, 97, 60, 3); // => 40 / 160 = 0.25
 */
export function stolenBaseAttemptRate(SB: number, CS: number, singles: number, BB: number, HBP: number): number {
  const timesOnFirst = singles + BB + HBP;
  return timesOnFirst === 0 ? NaN : (SB + CS) / timesOnFirst;
}
