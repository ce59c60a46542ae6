import type { Rate } from './Rate.ts';
import { totalBases, type HitCounts } from './totalBases.ts';

/**
 * Slugging percentage (SLG): total bases per official at-bat.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * SLG = TB / AB, with TB from `totalBases`.
 * Units: bases per at-bat, from 0 to 4; higher is better.
 * `rateOf` gives NaN when AB is 0.
 *
 * @example
 * rateOf(sluggingPercentage, { H: 150, doubles: 30, triples: 3, HR: 20, AB: 500 }); // => 246 / 500 = 0.492
 */
export const sluggingPercentage: Rate<HitCounts & { readonly AB: number }> = {
  name: 'sluggingPercentage',
  formula: 'TB / AB',
  source: 'Official Baseball Rules',
  numerator: totalBases,
  denominator: (c) => c.AB,
};
