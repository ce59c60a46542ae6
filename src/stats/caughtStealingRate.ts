/**
 * Caught-stealing rate (CS%) of a catcher: the share of steal attempts against him that he throws out.
 *
 * Source: common practice: CS% = CS / (SB + CS), attempts being stolen bases allowed plus runners caught.
 * Units: a fraction from 0 to 1; higher is better for the catcher.
 * Returns NaN when SB + CS is 0 (no attempts).
 *
 * @param CS runners caught stealing
 * @param SB stolen bases allowed
 * @example
 * caughtStealingRate(15, 45); // => 0.25
 */
export function caughtStealingRate(CS: number, SB: number): number {
  const attempts = SB + CS;
  return attempts === 0 ? NaN : CS / attempts;
}
