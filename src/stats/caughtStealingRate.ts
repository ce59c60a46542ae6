import type { Rate } from './Rate.ts';

/**
 * Caught-stealing rate (CS%) of a catcher: the share of steal attempts against him that he throws out.
 *
 * Source: common practice: CS% = CS / attempts, attempts being stolen bases allowed plus runners
 * caught (the fielding file's `sb_against` and `cs_caught`).
 * Units: a fraction from 0 to 1; higher is better for the catcher.
 * `rateOf` gives NaN when there were no attempts.
 *
 * @example
 * rateOf(caughtStealingRate, { csCaught: 15, sbAgainst: 60 }); // => 0.25
 */
export const caughtStealingRate: Rate<{ readonly csCaught: number; readonly sbAgainst: number }> = {
  name: 'caughtStealingRate',
  formula: 'CS / (SB + CS)',
  source: 'common practice',
  numerator: (c) => c.csCaught,
  denominator: (c) => c.sbAgainst,
};
