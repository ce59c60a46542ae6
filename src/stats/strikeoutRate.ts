/**
 * Strikeout rate (K%) of a batter: strikeouts per plate appearance.
 *
 * Source: common practice: K% = SO / PA.
 * Units: a fraction from 0 to 1 (not a percentage); lower is better for the batter.
 * Returns NaN when PA is 0.
 *
 * @example
 * strikeoutRate(100, 570); // => 0.17544...
 */
export function strikeoutRate(SO: number, PA: number): number {
  return PA === 0 ? NaN : SO / PA;
}
