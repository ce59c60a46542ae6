import type { Rate } from './Rate.ts';

/**
 * Earned run average (ERA): earned runs allowed per nine innings.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * ERA = 9 * ER / IP. Innings are counted in outs (an integer): IP = outs / 3.
 * Units: runs per nine innings; lower is better.
 * `rateOf` gives NaN when outs is 0.
 *
 * @example
 * rateOf(era, { ER: 60, outs: 540 }); // => 9 * 60 / 180 = 3
 */
export const era: Rate<{ readonly ER: number; readonly outs: number }> = {
  name: 'era',
  formula: '9 * ER / IP',
  source: 'Official Baseball Rules',
  numerator: (c) => 9 * c.ER,
  denominator: (c) => c.outs / 3,
};
