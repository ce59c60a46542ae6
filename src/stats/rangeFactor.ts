import type { Rate } from './Rate.ts';

/**
 * Range factor per nine innings (RF/9): putouts plus assists per nine innings in the field.
 *
 * Source: common practice: RF/9 = 9 * (PO + A) / innings. Innings are counted in outs (an integer):
 * innings = outs / 3, so RF/9 = 27 * (PO + A) / outs.
 * Units: plays made per nine innings; higher is better (compare within one position only).
 * `rateOf` gives NaN when outs is 0.
 *
 * @example
 * rateOf(rangeFactor, { PO: 240, A: 380, outs: 3600 }); // => 9 * 620 / 1200 = 4.65
 */
export const rangeFactor: Rate<{ readonly PO: number; readonly A: number; readonly outs: number }> = {
  name: 'rangeFactor',
  formula: '27 * (PO + A) / outs',
  source: 'common practice',
  numerator: (c) => 27 * (c.PO + c.A),
  denominator: (c) => c.outs,
};
