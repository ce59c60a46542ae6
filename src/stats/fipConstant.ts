/**
 * FIP constant (C): the league constant that puts FIP on the ERA scale, chosen so that the league's own
 * FIP equals its ERA.
 *
 * Source: common practice (from memory): C = lgERA - (13 * lgHR + 3 * (lgBB + lgHBP) - 2 * lgSO) / lgIP.
 * Innings are passed as outs (an integer): IP = outs / 3.
 * Units: runs per nine innings; a level, neither better nor worse (typically about 3 to 3.3).
 * Returns NaN when lgOuts is 0.
 *
 * @param lgERA league earned run average (27 * lgER / lgOuts)
 * @param lgOuts league innings pitched in outs
 * @example
 * fipConstant(4, 1000, 3000, 500, 8000, 43200); // => 4 - 7500 / 14400 = 3.47916...
 */
export function fipConstant(
  lgERA: number,
  lgHR: number,
  lgBB: number,
  lgHBP: number,
  lgSO: number,
  lgOuts: number,
): number {
  if (lgOuts === 0) return NaN;
  const innings = lgOuts / 3;
  return lgERA - (13 * lgHR + 3 * (lgBB + lgHBP) - 2 * lgSO) / innings;
}
