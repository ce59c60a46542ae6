import type { RosterLookups } from './RosterLookups.ts';
import { StintGroups } from './StintGroups.ts';
import { combineFieldingStints } from './combineFieldingStints.ts';
import { readTable, type TableOptions, type TableRead } from './readTable.ts';
import type { FieldPosition, FieldingSeason } from './types.ts';

type Writable<T> = { -readonly [K in keyof T]: T[K] };

const POSITIONS: ReadonlySet<FieldPosition | 'P'> = new Set<FieldPosition | 'P'>(
  ['C', '1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF', 'P'],
);

/**
 * Reads fielding.csv (one row per player, season, level, team and position),
 * checks every row and combines the stints of a player, season, level and
 * position (see combineFieldingStints). Rows at P are checked like the
 * others, then left out (pitchers' fielding is not profiled) and counted in
 * `pitcherRows`.
 */
export async function readFielding(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly fielding: FieldingSeason[]; readonly pitcherRows: number }> {
  const groups = new StintGroups<FieldingSeason>('player, season, level, team and position');
  const teamOf = (s: { readonly teams: readonly string[] }): string => s.teams[0] ?? '';
  const pitcherTeams = new StintGroups<{ readonly teams: readonly string[] }>('player, season, level, team and position');
  let pitcherRows = 0;
  const read = await readTable(options, 'fielding.csv', (ctx) => {
    const h = ctx.header;
    const c = {
      playerId: h.col('player_id'), season: h.col('season'), level: h.col('level'), team: h.col('team'),
      pos: h.col('pos'), G: h.col('G'), inn: h.col('inn'), PO: h.col('PO'), A: h.col('A'), E: h.col('E'),
      arm: h.col('arm_mph'), pop: h.col('pop_2b_s'), exchange: h.col('exchange_s'),
      sbAgainst: h.col('sb_against'), csCaught: h.col('cs_caught'),
    };
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const { playerId, season, level, team } = lookups.stintOf(row, c);
      const pos = row.oneOf(c.pos, POSITIONS, 'a position: C, 1B, 2B, 3B, SS, LF, CF, RF (or P, read and skipped)');
      const G = row.countOpt(c.G);
      const outs = row.thirds(c.inn);
      const PO = row.count(c.PO);
      const A = row.count(c.A);
      const E = row.count(c.E);
      const armMph = row.measured(c.arm);
      const pop2bS = row.measured(c.pop);
      const exchangeS = row.measured(c.exchange);
      const sbAgainst = row.countOpt(c.sbAgainst);
      const csCaught = row.countOpt(c.csCaught);
      row.atMost(c.csCaught, 'cs_caught', csCaught, 'sb_against', sbAgainst);

      const target = pos === 'P' ? pitcherTeams : groups;
      const key = target.settleRow(row, { playerId, season, level, team, part: pos ?? null }, () => ctx.settle(), teamOf);
      if (key === null || pos === undefined) return;
      const teams = team === undefined ? [] : [team];
      if (pos === 'P') {
        pitcherRows += 1;
        pitcherTeams.add(key, { teams }, line);
        return;
      }
      const stint: Writable<FieldingSeason> = { playerId, season, level, pos, teams, outs, PO, A, E };
      if (G !== undefined) stint.G = G;
      if (armMph !== undefined) stint.armMph = armMph;
      if (pop2bS !== undefined) stint.pop2bS = pop2bS;
      if (exchangeS !== undefined) stint.exchangeS = exchangeS;
      if (sbAgainst !== undefined) stint.sbAgainst = sbAgainst;
      if (csCaught !== undefined) stint.csCaught = csCaught;
      groups.add(key, stint, line);
    };
  });
  return { ...read, fielding: groups.collect((s) => s, combineFieldingStints), pitcherRows };
}
