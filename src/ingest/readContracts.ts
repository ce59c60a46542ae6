import { KeyLines, type RosterLookups } from './RosterLookups.ts';
import { readTable, type TableOptions, type TableRead } from './readTable.ts';
import type { Contract } from './types.ts';

/** Reads contracts.csv (optional): player_id, season, salary_usd (0 or more); one row per player and season. */
export async function readContracts(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly contracts: Contract[] }> {
  const contracts: Contract[] = [];
  const keys = new KeyLines('player and season');
  const read = await readTable(options, 'contracts.csv', (ctx) => {
    const h = ctx.header;
    const c = { playerId: h.col('player_id'), season: h.col('season'), salary: h.col('salary_usd') };
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const playerId = lookups.player(row, c.playerId);
      const season = row.season(c.season);
      const salaryUsd = row.numberOpt(c.salary, 0, Infinity, 'a salary in USD') ?? Number.NaN;
      if (playerId !== '' && !Number.isNaN(season)) keys.check(row, `${playerId}\u0000${season}`, `${playerId} ${season}`);
      if (ctx.settle()) contracts.push({ playerId, season, salaryUsd });
    };
  });
  return { ...read, contracts };
}
