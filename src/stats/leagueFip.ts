import { fip } from './fip.ts';
import { fipConstant, type LeaguePitchingTotals } from './fipConstant.ts';
import { era } from './era.ts';
import { rateOf } from './Rate.ts';

export interface LeagueFip {
  /** FIP constant C of the league (src/stats/fipConstant.ts). */
  readonly constant: number;
  /** The league's own FIP with that constant; equal to its ERA by construction of C. */
  readonly FIP: number;
  readonly ERA: number;
  readonly outs: number;
}

/**
 * A league's FIP constant and FIP from the sum of its pitching lines (the only place lines are
 * summed for the constant: profiles and outcomes both call it):
 * C = lgERA - (13 lgHR + 3 (lgBB + lgHBP) - 2 lgSO) / lgIP, lgFIP = FIP(league totals, C) = lgERA.
 *
 * Source: common practice (from memory), as in src/stats/fipConstant.ts and fip.ts.
 * Units: runs per nine innings; NaN when the lines hold no out.
 *
 * @example
 * leagueFip([{ ER: 80, outs: 540, HR: 20, BB: 60, HBP: 5, SO: 150 }]);
 * // lgERA = 27 * 80 / 540 = 4; C = 4 - (260 + 195 - 300) / 180 = 3.1388...; FIP = 4
 */
export function leagueFip(lines: Iterable<LeaguePitchingTotals>): LeagueFip {
  let ER = 0, outs = 0, HR = 0, BB = 0, HBP = 0, SO = 0;
  for (const p of lines) {
    ER += p.ER;
    outs += p.outs;
    HR += p.HR;
    BB += p.BB;
    HBP += p.HBP;
    SO += p.SO;
  }
  const totals = { ER, outs, HR, BB, HBP, SO };
  const constant = fipConstant(totals);
  return { constant, FIP: fip(totals, constant), ERA: rateOf(era, totals), outs };
}
