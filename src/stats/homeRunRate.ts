import type { Rate } from './Rate.ts';

/**
 * Home run rate (HR%) of a batter: home runs per plate appearance.
 *
 * Source: common practice: HR% = HR / PA.
 * Units: a fraction from 0 to 1 (not a percentage); higher is better for the batter.
 * `rateOf` gives NaN when PA is 0.
 *
 * @example
 * rateOf(homeRunRate, { HR: 20, PA: 500 }); // => 0.04
 */
export const homeRunRate: Rate<{ readonly HR: number; readonly PA: number }> = {
  name: 'homeRunRate',
  formula: 'HR / PA',
  source: 'common practice',
  numerator: (c) => c.HR,
  denominator: (c) => c.PA,
};
