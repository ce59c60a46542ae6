import type { Rate } from './Rate.ts';

/**
 * Batting average on balls in play (BABIP): how often a ball put in play, other than a home run, falls for a hit.
 *
 * Source: common practice: BABIP = (H - HR) / (AB - SO - HR + SF).
 * Units: a fraction from 0 to 1; higher is better for the batter.
 * `rateOf` gives NaN when AB - SO - HR + SF is 0.
 *
 * @example
 * rateOf(babip, { H: 150, HR: 20, AB: 500, SO: 100, SF: 5 }); // => 130 / 385 = 0.33766...
 */
export const babip: Rate<{
  readonly H: number;
  readonly HR: number;
  readonly AB: number;
  readonly SO: number;
  readonly SF: number;
}> = {
  name: 'babip',
  formula: '(H - HR) / (AB - SO - HR + SF)',
  source: 'common practice',
  numerator: (c) => c.H - c.HR,
  denominator: (c) => c.AB - c.SO - c.HR + c.SF,
};
