/**
 * Stolen-base success rate (SB%): the share of steal attempts that succeed.
 *
 * Source: common practice: SB% = SB / (SB + CS).
 * Units: a fraction from 0 to 1; higher is better.
 * Returns NaN when SB + CS is 0 (no attempts).
 *
 * @example
 * stolenBaseSuccess(30, 10); // => 0.75
 */
export function stolenBaseSuccess(SB: number, CS: number): number {
  const attempts = SB + CS;
  return attempts === 0 ? NaN : SB / attempts;
}
