/**
 * Strikeout rate (K%) of a pitcher: strikeouts per batter faced.
 *
 * Source: common practice: K% = SO / BF.
 * Units: a fraction from 0 to 1 (not a percentage); higher is better for the pitcher.
 * Returns NaN when BF is 0.
 *
 * @example
 * pitcherStrikeoutRate(180, 750); // => 0.24
 */
export function pitcherStrikeoutRate(SO: number, BF: number): number {
  return BF === 0 ? NaN : SO / BF;
}
