/**
 * Range factor per nine innings (RF/9): putouts plus assists per nine innings in the field.
 *
 * Source: common practice: RF/9 = 9 * (PO + A) / innings. Innings are passed as outs (an integer):
 * innings = outs / 3, so RF/9 = 27 * (PO + A) / outs.
 * Units: plays made per nine innings; higher is better (compare within one position only).
 * Returns NaN when outs is 0.
 *
 * @param outs innings in the field in outs (innings * 3)
 * @example
 * rangeFactor(240, 380, 3600); // => 9 * 620 / 1200 = 4.65
 */
export function rangeFactor(PO: number, A: number, outs: number): number {
  if (outs === 0) return NaN;
  return (9 * (PO + A)) / (outs / 3);
}
