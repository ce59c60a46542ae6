import type { Rate } from './Rate.ts';

/**
 * Walk rate (BB%) of a batter: walks per plate appearance.
 *
 * Source: common practice: BB% = BB / PA (intentional walks included).
 * Units: a fraction from 0 to 1 (not a percentage); higher is better for the batter.
 * `rateOf` gives NaN when PA is 0.
 *
 * @example
 * rateOf(walkRate, { BB: 60, PA: 600 }); // => 0.1
 */
export const walkRate: Rate<{ readonly BB: number; readonly PA: number }> = {
  name: 'walkRate',
  formula: 'BB / PA',
  source: 'common practice',
  numerator: (c) => c.BB,
  denominator: (c) => c.PA,
};
