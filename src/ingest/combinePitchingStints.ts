import { WeightedMean } from './WeightedMean.ts';
import type { PitchingSeason } from './types.ts';

type Writable<T> = { -readonly [K in keyof T]: T[K] };

/**
 * Combines the pitching stints of one player, season and level (file
 * order): counts and outs summed; fb_mph, fb_spin_rpm and whiff_pct weighted
 * by batters faced; gb_pct weighted by balls in play (BF - SO - BB - HBP).
 * A weighted mean uses only the stints that have the value.
 *
 * @example
 * // stint 1: BF 340, SO 90, BB 30, HBP 4, gb 45; stint 2: BF 90, SO 25, BB 10, HBP 1, gb 40
 * // => balls in play 216 and 54, gbPct (45*216 + 40*54) / 270 = 44
 */
export function combinePitchingStints(stints: readonly PitchingSeason[]): PitchingSeason {
  const [first, ...rest] = stints;
  if (first === undefined) throw new RangeError('combinePitchingStints needs at least one stint');
  const out: Writable<PitchingSeason> = {
    playerId: first.playerId, season: first.season, level: first.level, teams: [],
    G: first.G, GS: first.GS, outs: first.outs, BF: first.BF, H: first.H, HR: first.HR, BB: first.BB,
    HBP: first.HBP, SO: first.SO, ER: first.ER,
  };
  const teams: string[] = [...first.teams];
  for (const s of rest) {
    for (const t of s.teams) if (!teams.includes(t)) teams.push(t);
    out.G += s.G;
    out.GS += s.GS;
    out.outs += s.outs;
    out.BF += s.BF;
    out.H += s.H;
    out.HR += s.HR;
    out.BB += s.BB;
    out.HBP += s.HBP;
    out.SO += s.SO;
    out.ER += s.ER;
  }
  out.teams = teams;
  const fb = new WeightedMean();
  const spin = new WeightedMean();
  const whiff = new WeightedMean();
  const gb = new WeightedMean();
  for (const s of stints) {
    const inPlay = s.BF - s.SO - s.BB - s.HBP;
    if (s.fbMph !== undefined) fb.add(s.fbMph, s.BF, s.BF);
    if (s.fbSpinRpm !== undefined) spin.add(s.fbSpinRpm, s.BF, s.BF);
    if (s.whiffPct !== undefined) whiff.add(s.whiffPct, s.BF, s.BF);
    if (s.gbPct !== undefined) gb.add(s.gbPct, inPlay, inPlay);
  }
  const fbMph = fb.value();
  const fbSpinRpm = spin.value();
  const whiffPct = whiff.value();
  const gbPct = gb.value();
  if (fbMph !== undefined) out.fbMph = fbMph;
  if (fbSpinRpm !== undefined) out.fbSpinRpm = fbSpinRpm;
  if (whiffPct !== undefined) out.whiffPct = whiffPct;
  if (gbPct !== undefined) out.gbPct = gbPct;
  return out;
}
