import type { Rate } from './Rate.ts';

/**
 * Strikeout rate (K%) of a pitcher: strikeouts per batter faced.
 *
 * Source: common practice: K% = SO / BF.
 * Units: a fraction from 0 to 1 (not a percentage); higher is better for the pitcher.
 * `rateOf` gives NaN when BF is 0.
 *
 * @example
 * rateOf(pitcherStrikeoutRate, { SO: 180, BF: 750 }); // => 0.24
 */
export const pitcherStrikeoutRate: Rate<{ readonly SO: number; readonly BF: number }> = {
  name: 'pitcherStrikeoutRate',
  formula: 'SO / BF',
  source: 'common practice',
  numerator: (c) => c.SO,
  denominator: (c) => c.BF,
};
