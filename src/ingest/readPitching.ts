import type { RosterLookups } from './RosterLookups.ts';
import { StintGroups } from './StintGroups.ts';
import { combinePitchingStints } from './combinePitchingStints.ts';
import { readTable, type TableOptions, type TableRead } from './readTable.ts';
import type { PitchingSeason } from './types.ts';

type Writable<T> = { -readonly [K in keyof T]: T[K] };

/**
 * Reads pitching.csv (one row per player, season, level and team), checks
 * every row and combines the stints of a player, season and level
 * (see combinePitchingStints).
 */
export async function readPitching(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly pitching: PitchingSeason[] }> {
  const groups = new StintGroups<PitchingSeason>('player, season, level and team');
  const teamOf = (s: PitchingSeason): string => s.teams[0] ?? '';
  const read = await readTable(options, 'pitching.csv', (ctx) => {
    const h = ctx.header;
    const c = {
      playerId: h.col('player_id'), season: h.col('season'), level: h.col('level'), team: h.col('team'),
      G: h.col('G'), GS: h.col('GS'), IP: h.col('IP'), BF: h.col('BF'), H: h.col('H'), HR: h.col('HR'),
      BB: h.col('BB'), HBP: h.col('HBP'), SO: h.col('SO'), ER: h.col('ER'),
      fb: h.col('fb_mph'), spin: h.col('fb_spin_rpm'), whiff: h.col('whiff_pct'), gb: h.col('gb_pct'),
    };
    const whiffWatch = ctx.watchPercent(c.whiff);
    const gbWatch = ctx.watchPercent(c.gb);
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const { playerId, season, level, team } = lookups.stintOf(row, c);
      const G = row.count(c.G);
      const GS = row.count(c.GS);
      const outs = row.thirds(c.IP);
      const BF = row.count(c.BF);
      const H = row.count(c.H);
      const HR = row.count(c.HR);
      const BB = row.count(c.BB);
      const HBP = row.count(c.HBP);
      const SO = row.count(c.SO);
      const ER = row.count(c.ER);
      const fbMph = row.measured(c.fb);
      const fbSpinRpm = row.measured(c.spin);
      const whiffPct = row.percent(c.whiff);
      const gbPct = row.percent(c.gb);

      row.atMost(c.GS, 'GS', GS, 'G', G);
      row.atMost(c.H, 'H', H, 'BF', BF);
      row.atMost(c.HR, 'HR', HR, 'H', H);
      row.atMost(c.BF, 'SO + BB + HBP', SO + BB + HBP, 'BF', BF);
      whiffWatch.see(whiffPct, line);
      gbWatch.see(gbPct, line);

      const key = groups.settleRow(row, { playerId, season, level, team }, () => ctx.settle(), teamOf);
      if (key === null) return;
      const stint: Writable<PitchingSeason> = {
        playerId, season, level, teams: team === undefined ? [] : [team],
        G, GS, outs, BF, H, HR, BB, HBP, SO, ER,
      };
      if (fbMph !== undefined) stint.fbMph = fbMph;
      if (fbSpinRpm !== undefined) stint.fbSpinRpm = fbSpinRpm;
      if (whiffPct !== undefined) stint.whiffPct = whiffPct;
      if (gbPct !== undefined) stint.gbPct = gbPct;
      groups.add(key, stint, line);
    };
  });
  return { ...read, pitching: groups.collect((s) => s, combinePitchingStints) };
}
