/**
 * Walks plus hits per inning pitched (WHIP).
 *
 * Source: common practice: WHIP = (BB + H) / IP (hit-by-pitches not counted).
 * Innings are passed as outs (an integer): IP = outs / 3.
 * Units: baserunners per inning; lower is better.
 * Returns NaN when outs is 0.
 *
 * @param outs innings pitched in outs (IP * 3)
 * @example
 * whip(150, 50, 540); // => 200 / 180 = 1.11111...
 */
export function whip(H: number, BB: number, outs: number): number {
  if (outs === 0) return NaN;
  return (H + BB) / (outs / 3);
}
