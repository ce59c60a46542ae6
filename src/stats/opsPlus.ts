/**
 * League-relative OPS (OPS+): on-base and slugging each against the league, scaled so the league is 100.
 *
 * Source: common practice: OPS+ = 100 * (OBP / lgOBP + SLG / lgSLG - 1).
 * No park factor is applied here (the usual published form divides by one); this is OPS+ against the
 * league as given.
 * Units: index points, league average = 100; higher is better.
 * Returns NaN when lgOBP or lgSLG is 0.
 *
 * @example
 * opsPlus(0.36, 0.48, 0.32, 0.40); // => 100 * (1.125 + 1.2 - 1) = 132.5
 */
export function opsPlus(OBP: number, SLG: number, lgOBP: number, lgSLG: number): number {
  if (lgOBP === 0 || lgSLG === 0) return NaN;
  return 100 * (OBP / lgOBP + SLG / lgSLG - 1);
}
