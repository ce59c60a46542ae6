/**
 * Walk rate (BB%) of a pitcher: walks per batter faced.
 *
 * Source: common practice: BB% = BB / BF (intentional walks included).
 * Units: a fraction from 0 to 1 (not a percentage); lower is better for the pitcher.
 * Returns NaN when BF is 0.
 *
 * @example
 * pitcherWalkRate(60, 750); // => 0.08
 */
export function pitcherWalkRate(BB: number, BF: number): number {
  return BF === 0 ? NaN : BB / BF;
}
