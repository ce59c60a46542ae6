import { WeightedMean, addCount } from './WeightedMean.ts';
import type { BattingSeason } from './types.ts';

type Writable<T> = { -readonly [K in keyof T]: T[K] };

/**
 * Combines the batting stints of one player, season and level (same key,
 * file order): counts summed (an optional count is unknown when a stint lacks
 * it); ev_avg_mph, ev_p90_mph, la_avg_deg, hard_hit_pct and sweet_spot_pct
 * weighted by bbe (by PA when a stint with the value lacks bbe); sprint_ft_s
 * weighted by PA. A weighted mean uses only the stints that have the value.
 *
 * @example
 * // stint 1: PA 120, bbe 80, ev_avg 88.5; stint 2: PA 60, bbe 40, ev_avg 85.5
 * // => PA 180, bbe 120, evAvgMph (88.5*80 + 85.5*40) / 120 = 87.5
 */
export function combineBattingStints(stints: readonly BattingSeason[]): BattingSeason {
  const [first, ...rest] = stints;
  if (first === undefined) throw new RangeError('combineBattingStints needs at least one stint');
  const out: Writable<BattingSeason> = {
    playerId: first.playerId, season: first.season, level: first.level, teams: [],
    PA: first.PA, AB: first.AB, H: first.H, doubles: first.doubles, triples: first.triples, HR: first.HR,
    BB: first.BB, HBP: first.HBP, SF: first.SF, SO: first.SO,
  };
  let { G, IBB, SB, CS, bbe } = first;
  const teams: string[] = [...first.teams];
  for (const s of rest) {
    for (const t of s.teams) if (!teams.includes(t)) teams.push(t);
    out.PA += s.PA;
    out.AB += s.AB;
    out.H += s.H;
    out.doubles += s.doubles;
    out.triples += s.triples;
    out.HR += s.HR;
    out.BB += s.BB;
    out.HBP += s.HBP;
    out.SF += s.SF;
    out.SO += s.SO;
    G = addCount(G, s.G);
    IBB = addCount(IBB, s.IBB);
    SB = addCount(SB, s.SB);
    CS = addCount(CS, s.CS);
    bbe = addCount(bbe, s.bbe);
  }
  out.teams = teams;
  if (G !== undefined) out.G = G;
  if (IBB !== undefined) out.IBB = IBB;
  if (SB !== undefined) out.SB = SB;
  if (CS !== undefined) out.CS = CS;
  if (bbe !== undefined) out.bbe = bbe;
  const byBbe = (pick: (s: BattingSeason) => number | undefined): number | undefined => {
    const m = new WeightedMean();
    for (const s of stints) {
      const v = pick(s);
      if (v !== undefined) m.add(v, s.bbe, s.PA);
    }
    return m.value();
  };
  const evAvgMph = byBbe((s) => s.evAvgMph);
  const evP90Mph = byBbe((s) => s.evP90Mph);
  const laAvgDeg = byBbe((s) => s.laAvgDeg);
  const hardHitPct = byBbe((s) => s.hardHitPct);
  const sweetSpotPct = byBbe((s) => s.sweetSpotPct);
  const sprint = new WeightedMean();
  for (const s of stints) if (s.sprintFtS !== undefined) sprint.add(s.sprintFtS, s.PA, s.PA);
  const sprintFtS = sprint.value();
  if (evAvgMph !== undefined) out.evAvgMph = evAvgMph;
  if (evP90Mph !== undefined) out.evP90Mph = evP90Mph;
  if (laAvgDeg !== undefined) out.laAvgDeg = laAvgDeg;
  if (hardHitPct !== undefined) out.hardHitPct = hardHitPct;
  if (sweetSpotPct !== undefined) out.sweetSpotPct = sweetSpotPct;
  if (sprintFtS !== undefined) out.sprintFtS = sprintFtS;
  return out;
}
