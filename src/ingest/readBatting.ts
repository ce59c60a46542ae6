import { BATTING_CHECKS, BATTING_COLUMNS } from './battingColumns.ts';
import type { RosterLookups } from './RosterLookups.ts';
import { readSeasonFile } from './readSeasonFile.ts';
import type { TableOptions, TableRead } from './readTable.ts';
import type { BattingSeason } from './Roster.ts';

/**
 * Reads batting.csv (one row per player, season, level and team) as its
 * column table says (battingColumns.ts), checks every row and combines the
 * stints of a player, season and level.
 */
export async function readBatting(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly batting: BattingSeason[] }> {
  const { records, ...read } = await readSeasonFile(options, lookups, 'batting.csv', BATTING_COLUMNS, BATTING_CHECKS);
  return { ...read, batting: records };
}
