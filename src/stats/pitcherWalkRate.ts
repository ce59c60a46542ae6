import type { Rate } from './Rate.ts';

/**
 * Walk rate (BB%) of a pitcher: walks per batter faced.
 *
 * Source: common practice: BB% = BB / BF (intentional walks included).
 * Units: a fraction from 0 to 1 (not a percentage); lower is better for the pitcher.
 * `rateOf` gives NaN when BF is 0.
 *
 * @example
 * rateOf(pitcherWalkRate, { BB: 60, BF: 750 }); // => 0.08
 */
export const pitcherWalkRate: Rate<{ readonly BB: number; readonly BF: number }> = {
  name: 'pitcherWalkRate',
  formula: 'BB / BF',
  source: 'common practice',
  numerator: (c) => c.BB,
  denominator: (c) => c.BF,
};
