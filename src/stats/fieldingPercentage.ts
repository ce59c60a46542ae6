/**
 * Fielding percentage (FPCT): the share of total chances handled without an error.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * FPCT = (PO + A) / (PO + A + E).
 * Units: a fraction from 0 to 1; higher is better.
 * Returns NaN when PO + A + E is 0 (no chances).
 *
 * @example
 * fieldingPercentage(240, 380, 20); // => 620 / 640 = 0.96875
 */
export function fieldingPercentage(PO: number, A: number, E: number): number {
  const chances = PO + A + E;
  return chances === 0 ? NaN : (PO + A) / chances;
}
