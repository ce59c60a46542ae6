import type { Rate } from './Rate.ts';
import { totalBases, type HitCounts } from './totalBases.ts';

/**
 * Isolated power (ISO): extra bases per at-bat, i.e. slugging minus batting average.
 *
 * Source: common practice: ISO = SLG - AVG = (TB - H) / AB.
 * Units: extra bases per at-bat, from 0 to 3; higher is better.
 * `rateOf` gives NaN when AB is 0.
 *
 * @example
 * rateOf(isolatedPower, { H: 150, doubles: 30, triples: 3, HR: 20, AB: 500 }); // => 96 / 500 = 0.192
 */
export const isolatedPower: Rate<HitCounts & { readonly AB: number }> = {
  name: 'isolatedPower',
  formula: '(TB - H) / AB',
  source: 'common practice',
  numerator: (c) => totalBases(c) - c.H,
  denominator: (c) => c.AB,
};
