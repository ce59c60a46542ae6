import { era } from './era.ts';
import { fipWithoutConstant, type FipCounts } from './fip.ts';
import { rateOf } from './Rate.ts';

/** A league's pitching totals: the FIP counts and its earned runs. */
export interface LeaguePitchingTotals extends FipCounts {
  readonly ER: number;
}

/**
 * FIP constant (C): the league constant that puts FIP on the ERA scale, chosen so that the league's own
 * FIP equals its ERA.
 *
 * Source: common practice (from memory): C = lgERA - (13 * lgHR + 3 * (lgBB + lgHBP) - 2 * lgSO) / lgIP,
 * with lgERA = 9 * lgER / lgIP (src/stats/era.ts).
 * Units: runs per nine innings; a level, neither better nor worse (typically about 3 to 3.3).
 * Returns NaN when the league has no out.
 *
 * @example
 * fipConstant({ ER: 4800, HR: 1000, BB: 3000, HBP: 500, SO: 8000, outs: 43200 });
 * // lgERA = 9 * 4800 / 14400 = 3; C = 3 - 7500 / 14400 = 2.47916...
 */
export function fipConstant(league: LeaguePitchingTotals): number {
  return rateOf(era, league) - fipWithoutConstant(league);
}
