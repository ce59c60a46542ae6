import type { Rate } from './Rate.ts';

/**
 * Home run rate (HR%) of a pitcher: home runs allowed per batter faced.
 *
 * Source: common practice: HR% = HR / BF.
 * Units: a fraction from 0 to 1 (not a percentage); lower is better for the pitcher.
 * `rateOf` gives NaN when BF is 0.
 *
 * @example
 * rateOf(pitcherHomeRunRate, { HR: 15, BF: 750 }); // => 0.02
 */
export const pitcherHomeRunRate: Rate<{ readonly HR: number; readonly BF: number }> = {
  name: 'pitcherHomeRunRate',
  formula: 'HR / BF',
  source: 'common practice',
  numerator: (c) => c.HR,
  denominator: (c) => c.BF,
};
