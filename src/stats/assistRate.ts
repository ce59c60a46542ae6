import type { Rate } from './Rate.ts';

/**
 * Assists per nine innings in the field: for an outfielder, his throws that retired a runner (an
 * outfield assist is credited for a throw that puts a runner out).
 *
 * Source: common practice: assists per nine innings = 9 * A / innings, innings = outs / 3, so
 * 27 * A / outs (the assists half of range factor, RF/9 = 9 * (PO + A) / innings).
 * Units: assists per nine innings; higher is better (compare within one position only).
 * `rateOf` gives NaN when outs is 0.
 *
 * @example
 * rateOf(assistRate, { A: 8, outs: 3600 }); // => 9 * 8 / 1200 = 0.06
 */
export const assistRate: Rate<{ readonly A: number; readonly outs: number }> = {
  name: 'assistRate',
  formula: '27 * A / outs',
  source: 'common practice',
  numerator: (c) => 27 * c.A,
  denominator: (c) => c.outs,
};
