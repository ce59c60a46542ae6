import type { Rate } from './Rate.ts';

/**
 * Batting average (AVG): hits per official at-bat.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * batting average = H / AB.
 * Units: a fraction from 0 to 1 (printed to three decimals); higher is better.
 * `rateOf` gives NaN when AB is 0.
 *
 * @example
 * rateOf(battingAverage, { H: 150, AB: 500 }); // => 0.3
 */
export const battingAverage: Rate<{ readonly H: number; readonly AB: number }> = {
  name: 'battingAverage',
  formula: 'H / AB',
  source: 'Official Baseball Rules',
  numerator: (c) => c.H,
  denominator: (c) => c.AB,
};
