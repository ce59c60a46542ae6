/** The counts FIP is built from: home runs, walks, hit-by-pitches, strikeouts and innings in outs. */
export interface FipCounts {
  readonly HR: number;
  readonly BB: number;
  readonly HBP: number;
  readonly SO: number;
  /** Innings pitched in outs (IP * 3): 6.2 innings is 20 outs. */
  readonly outs: number;
}

/**
 * Fielding-independent pitching (FIP): an ERA-scaled estimate from the outcomes a pitcher controls
 * most directly (home runs, walks, hit-by-pitches, strikeouts).
 *
 * Source: common practice, the formula as circulated in public baseball analysis (from memory):
 * FIP = (13 * HR + 3 * (BB + HBP) - 2 * SO) / IP + C, with C the league constant from `fipConstant`.
 * Units: runs per nine innings (ERA scale); lower is better.
 * Returns NaN when outs is 0.
 *
 * @param constant league FIP constant (C)
 * @example
 * fip({ HR: 20, BB: 50, HBP: 5, SO: 180, outs: 540 }, 3.1); // => (260 + 165 - 360) / 180 + 3.1 = 3.46111...
 */
export function fip(c: FipCounts, constant: number): number {
  return c.outs === 0 ? NaN : fipWithoutConstant(c) + constant;
}

/** (13 * HR + 3 * (BB + HBP) - 2 * SO) / IP: FIP before the league constant (NaN when outs is 0). */
export function fipWithoutConstant(c: FipCounts): number {
  if (c.outs === 0) return NaN;
  const innings = c.outs / 3;
  return (13 * c.HR + 3 * (c.BB + c.HBP) - 2 * c.SO) / innings;
}
