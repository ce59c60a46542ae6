import type { Rate } from './Rate.ts';

/**
 * On-base percentage (OBP): how often a batter reaches base by hit, walk or hit-by-pitch.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * OBP = (H + BB + HBP) / (AB + BB + HBP + SF). Reaching on error, interference or a fielder's
 * choice does not count; sacrifice bunts are not in the denominator.
 * Units: a fraction from 0 to 1; higher is better.
 * `rateOf` gives NaN when AB + BB + HBP + SF is 0.
 *
 * @example
 * rateOf(onBasePercentage, { H: 150, BB: 60, HBP: 5, AB: 500, SF: 5 }); // => 215 / 570 = 0.37719...
 */
export const onBasePercentage: Rate<{
  readonly H: number;
  readonly BB: number;
  readonly HBP: number;
  readonly AB: number;
  readonly SF: number;
}> = {
  name: 'onBasePercentage',
  formula: '(H + BB + HBP) / (AB + BB + HBP + SF)',
  source: 'Official Baseball Rules',
  numerator: (c) => c.H + c.BB + c.HBP,
  denominator: (c) => c.AB + c.BB + c.HBP + c.SF,
};
