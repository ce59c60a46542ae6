import type { Rate } from './Rate.ts';

/**
 * Batting average on balls in play against a pitcher (BABIP against).
 *
 * Source: common practice approximation from pitching lines (which carry no AB or SF):
 * BABIP against = (H - HR) / (BF - SO - BB - HBP - HR). The denominator counts sacrifice bunts and
 * catcher's interference as balls in play, so it runs a little larger than the batting form
 * AB - SO - HR + SF.
 * Units: a fraction from 0 to 1; lower is better for the pitcher.
 * `rateOf` gives NaN when BF - SO - BB - HBP - HR is 0.
 *
 * @example
 * rateOf(babipAgainst, { H: 150, HR: 20, BF: 750, SO: 180, BB: 50, HBP: 5 }); // => 130 / 495 = 0.26262...
 */
export const babipAgainst: Rate<{
  readonly H: number;
  readonly HR: number;
  readonly BF: number;
  readonly SO: number;
  readonly BB: number;
  readonly HBP: number;
}> = {
  name: 'babipAgainst',
  formula: '(H - HR) / (BF - SO - BB - HBP - HR)',
  source: 'common practice approximation',
  numerator: (c) => c.H - c.HR,
  denominator: (c) => c.BF - c.SO - c.BB - c.HBP - c.HR,
};
