import type { BattingSeason, PitchingSeason, Roster } from '../ingest/Roster.ts';
import { fip } from '../stats/fip.ts';
import { fipMinus } from '../stats/fipMinus.ts';
import { onBasePercentage } from '../stats/onBasePercentage.ts';
import { opsPlus } from '../stats/opsPlus.ts';
import { sluggingPercentage } from '../stats/sluggingPercentage.ts';
import { rateOf } from '../stats/Rate.ts';
import { leagueBattingRates } from './leagueBattingRates.ts';
import { leagueFip } from '../stats/leagueFip.ts';
import { OUTCOMES_FORMAT, OUTCOMES_VERSION, type OutcomesFile } from '../store/outcomesFile.ts';

const finiteOrNull = (x: number, digits = 4): number | null => (Number.isFinite(x) ? Number(x.toFixed(digits)) : null);

function bySeason<T extends { readonly season: number }>(lines: readonly T[]): Map<number, T[]> {
  const out = new Map<number, T[]>();
  for (const l of lines) {
    const list = out.get(l.season);
    if (list) list.push(l);
    else out.set(l.season, [l]);
  }
  return out;
}

/**
 * The top-level outcomes of a roster for the store: each top-level batting line's PA and OPS+, each
 * top-level pitching line's outs, BF and FIP-, against the league totals of that season at the top
 * level of this same roster (no park factors):
 *   OPS+ = 100 (OBP / lgOBP + SLG / lgSLG - 1)                 (src/stats/opsPlus.ts)
 *   FIP- = 100 FIP / lgFIP, FIP with the season's constant C  (src/stats/fipMinus.ts, fip.ts, fipConstant.ts)
 * The top level is the last of roster.levels (levels.csv lists them from lowest to highest).
 */
export function computeOutcomes(roster: Roster): OutcomesFile {
  const top = roster.levels[roster.levels.length - 1] ?? '';
  let first = Infinity;
  let last = -Infinity;
  for (const table of [roster.batting, roster.pitching, roster.fielding]) {
    for (const r of table) {
      if (r.season < first) first = r.season;
      if (r.season > last) last = r.season;
    }
  }
  const topBatting: BattingSeason[] = roster.batting.filter((b) => b.level === top);
  const topPitching: PitchingSeason[] = roster.pitching.filter((p) => p.level === top);
  const battingBySeason = bySeason(topBatting);
  const pitchingBySeason = bySeason(topPitching);
  const seasons = [...new Set([...battingBySeason.keys(), ...pitchingBySeason.keys()])].sort((a, b) => a - b);

  const league: OutcomesFile['league'] = [];
  const batting: OutcomesFile['batting'] = [];
  const pitching: OutcomesFile['pitching'] = [];
  for (const season of seasons) {
    const bLines = battingBySeason.get(season) ?? [];
    const pLines = pitchingBySeason.get(season) ?? [];
    const lgBat = leagueBattingRates(bLines);
    const lgPit = leagueFip(pLines);
    league.push([season, finiteOrNull(lgBat.OBP, 6), finiteOrNull(lgBat.SLG, 6), finiteOrNull(lgPit.ERA, 6), finiteOrNull(lgPit.constant, 6), finiteOrNull(lgPit.FIP, 6)]);
    for (const b of bLines) {
      const OBP = rateOf(onBasePercentage, b);
      const SLG = rateOf(sluggingPercentage, b);
      batting.push([b.playerId, season, b.PA, finiteOrNull(opsPlus(OBP, SLG, lgBat.OBP, lgBat.SLG), 2)]);
    }
    for (const p of pLines) {
      const value = fipMinus(fip(p, lgPit.constant), lgPit.FIP);
      pitching.push([p.playerId, season, p.outs, p.BF, finiteOrNull(value, 2)]);
    }
  }
  return {
    format: OUTCOMES_FORMAT,
    version: OUTCOMES_VERSION,
    top_level: top,
    first_season: Number.isFinite(first) ? first : 0,
    last_season: Number.isFinite(last) ? last : 0,
    league,
    batting,
    pitching,
  };
}
