import type { Rate } from './Rate.ts';

/**
 * Fielding percentage (FPCT): the share of total chances handled without an error.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * FPCT = (PO + A) / (PO + A + E).
 * Units: a fraction from 0 to 1; higher is better.
 * `rateOf` gives NaN when PO + A + E is 0 (no chances).
 *
 * @example
 * rateOf(fieldingPercentage, { PO: 240, A: 380, E: 20 }); // => 620 / 640 = 0.96875
 */
export const fieldingPercentage: Rate<{ readonly PO: number; readonly A: number; readonly E: number }> = {
  name: 'fieldingPercentage',
  formula: '(PO + A) / (PO + A + E)',
  source: 'Official Baseball Rules',
  numerator: (c) => c.PO + c.A,
  denominator: (c) => c.PO + c.A + c.E,
};
