/**
 * Home run rate (HR%) of a pitcher: home runs allowed per batter faced.
 *
 * Source: common practice: HR% = HR / BF.
 * Units: a fraction from 0 to 1 (not a percentage); lower is better for the pitcher.
 * Returns NaN when BF is 0.
 *
 * @example
 * pitcherHomeRunRate(15, 750); // => 0.02
 */
export function pitcherHomeRunRate(HR: number, BF: number): number {
  return BF === 0 ? NaN : HR / BF;
}
