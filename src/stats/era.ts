/**
 * Earned run average (ERA): earned runs allowed per nine innings.
 *
 * Source: Official Baseball Rules, "Determining Percentage Records" (rule 9.21, number from memory):
 * ERA = 9 * ER / IP. Innings are passed as outs (an integer): IP = outs / 3, so ERA = 27 * ER / outs.
 * Units: runs per nine innings; lower is better.
 * Returns NaN when outs is 0.
 *
 * @param outs innings pitched in outs (IP * 3)
 * @example
 * era(60, 540); // => 9 * 60 / 180 = 3
 */
export function era(ER: number, outs: number): number {
  if (outs === 0) return NaN;
  return (9 * ER) / (outs / 3);
}
