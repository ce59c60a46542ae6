/**
 * Fielding-independent pitching (FIP): an ERA-scaled estimate from the outcomes a pitcher controls
 * most directly (home runs, walks, hit-by-pitches, strikeouts).
 *
 * Source: common practice, the formula as circulated in public baseball analysis (from memory):
 * FIP = (13 * HR + 3 * (BB + HBP) - 2 * SO) / IP + C, with C the league constant from `fipConstant`.
 * Innings are passed as outs (an integer): IP = outs / 3, so 6.2 innings is 20 outs.
 * Units: runs per nine innings (ERA scale); lower is better.
 * Returns NaN when outs is 0.
 *
 * @param outs innings pitched in outs (IP * 3)
 * @param constant league FIP constant (C)
 * @example
 * fip(20, 50, 5, 180, 540, 3.1); // => (260 + 165 - 360) / 180 + 3.1 = 3.46111...
 */
export function fip(HR: number, BB: number, HBP: number, SO: number, outs: number, constant: number): number {
  if (outs === 0) return NaN;
  const innings = outs / 3;
  return (13 * HR + 3 * (BB + HBP) - 2 * SO) / innings + constant;
}
