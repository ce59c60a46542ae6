import type { RosterLookups } from './RosterLookups.ts';
import { StintGroups } from './StintGroups.ts';
import { combineBattingStints } from './combineBattingStints.ts';
import { readTable, type TableOptions, type TableRead } from './readTable.ts';
import type { BattingSeason } from './types.ts';

type Writable<T> = { -readonly [K in keyof T]: T[K] };

/**
 * Reads batting.csv (one row per player, season, level and team), checks
 * every row and combines the stints of a player, season and level
 * (see combineBattingStints).
 */
export async function readBatting(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly batting: BattingSeason[] }> {
  const groups = new StintGroups<BattingSeason>('player, season, level and team');
  const teamOf = (s: BattingSeason): string => s.teams[0] ?? '';
  const read = await readTable(options, 'batting.csv', (ctx) => {
    const h = ctx.header;
    const c = {
      playerId: h.col('player_id'), season: h.col('season'), level: h.col('level'), team: h.col('team'),
      G: h.col('G'), PA: h.col('PA'), AB: h.col('AB'), H: h.col('H'), doubles: h.col('2B'), triples: h.col('3B'),
      HR: h.col('HR'), BB: h.col('BB'), HBP: h.col('HBP'), SF: h.col('SF'), SO: h.col('SO'),
      IBB: h.col('IBB'), SB: h.col('SB'), CS: h.col('CS'), bbe: h.col('bbe'),
      evAvg: h.col('ev_avg_mph'), evP90: h.col('ev_p90_mph'), laAvg: h.col('la_avg_deg'),
      hardHit: h.col('hard_hit_pct'), sweetSpot: h.col('sweet_spot_pct'), sprint: h.col('sprint_ft_s'),
    };
    const hardHitWatch = ctx.watchPercent(c.hardHit);
    const sweetSpotWatch = ctx.watchPercent(c.sweetSpot);
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const { playerId, season, level, team } = lookups.stintOf(row, c);
      const G = row.countOpt(c.G);
      const PA = row.count(c.PA);
      const AB = row.count(c.AB);
      const H = row.count(c.H);
      const doubles = row.count(c.doubles);
      const triples = row.count(c.triples);
      const HR = row.count(c.HR);
      const BB = row.count(c.BB);
      const HBP = row.count(c.HBP);
      const SF = row.count(c.SF);
      const SO = row.count(c.SO);
      const IBB = row.countOpt(c.IBB);
      const SB = row.countOpt(c.SB);
      const CS = row.countOpt(c.CS);
      const bbe = row.countOpt(c.bbe);
      const evAvgMph = row.measured(c.evAvg);
      const evP90Mph = row.measured(c.evP90);
      const laAvgDeg = row.measured(c.laAvg);
      const hardHitPct = row.percent(c.hardHit);
      const sweetSpotPct = row.percent(c.sweetSpot);
      const sprintFtS = row.measured(c.sprint);

      row.atMost(c.H, 'H', H, 'AB', AB);
      row.atMost(c.H, '2B + 3B + HR', doubles + triples + HR, 'H', H);
      row.atMost(c.PA, 'AB + BB + HBP + SF', AB + BB + HBP + SF, 'PA', PA);
      row.atMost(c.SO, 'SO', SO, 'PA', PA);
      row.atMost(c.IBB, 'IBB', IBB, 'BB', BB);
      row.atMost(c.bbe, 'bbe', bbe, 'PA', PA);
      row.atMost(c.evP90, 'ev_avg_mph', evAvgMph, 'ev_p90_mph', evP90Mph);
      hardHitWatch.see(hardHitPct, line);
      sweetSpotWatch.see(sweetSpotPct, line);

      const key = groups.settleRow(row, { playerId, season, level, team }, () => ctx.settle(), teamOf);
      if (key === null) return;
      const stint: Writable<BattingSeason> = {
        playerId, season, level, teams: team === undefined ? [] : [team],
        PA, AB, H, doubles, triples, HR, BB, HBP, SF, SO,
      };
      if (G !== undefined) stint.G = G;
      if (IBB !== undefined) stint.IBB = IBB;
      if (SB !== undefined) stint.SB = SB;
      if (CS !== undefined) stint.CS = CS;
      if (bbe !== undefined) stint.bbe = bbe;
      if (evAvgMph !== undefined) stint.evAvgMph = evAvgMph;
      if (evP90Mph !== undefined) stint.evP90Mph = evP90Mph;
      if (laAvgDeg !== undefined) stint.laAvgDeg = laAvgDeg;
      if (hardHitPct !== undefined) stint.hardHitPct = hardHitPct;
      if (sweetSpotPct !== undefined) stint.sweetSpotPct = sweetSpotPct;
      if (sprintFtS !== undefined) stint.sprintFtS = sprintFtS;
      groups.add(key, stint, line);
    };
  });
  return { ...read, batting: groups.collect((s) => s, combineBattingStints) };
}
