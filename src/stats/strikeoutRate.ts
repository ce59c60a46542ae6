import type { Rate } from './Rate.ts';

/**
 * Strikeout rate (K%) of a batter: strikeouts per plate appearance.
 *
 * Source: common practice: K% = SO / PA.
 * Units: a fraction from 0 to 1 (not a percentage); lower is better for the batter.
 * `rateOf` gives NaN when PA is 0.
 *
 * @example
 * rateOf(strikeoutRate, { SO: 100, PA: 570 }); // => 0.17544...
 */
export const strikeoutRate: Rate<{ readonly SO: number; readonly PA: number }> = {
  name: 'strikeoutRate',
  formula: 'SO / PA',
  source: 'common practice',
  numerator: (c) => c.SO,
  denominator: (c) => c.PA,
};
