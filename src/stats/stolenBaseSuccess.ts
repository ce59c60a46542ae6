import type { Rate } from './Rate.ts';

/**
 * Stolen-base success rate (SB%): the share of steal attempts that succeed.
 *
 * Source: common practice: SB% = SB / (SB + CS).
 * Units: a fraction from 0 to 1; higher is better.
 * `rateOf` gives NaN when SB + CS is 0 (no attempts).
 *
 * @example
 * rateOf(stolenBaseSuccess, { SB: 30, CS: 10 }); // => 0.75
 */
export const stolenBaseSuccess: Rate<{ readonly SB: number; readonly CS: number }> = {
  name: 'stolenBaseSuccess',
  formula: 'SB / (SB + CS)',
  source: 'common practice',
  numerator: (c) => c.SB,
  denominator: (c) => c.SB + c.CS,
};
