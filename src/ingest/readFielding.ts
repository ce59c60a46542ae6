import { FIELDING_CHECKS, FIELDING_COLUMNS } from './fieldingColumns.ts';
import type { RosterLookups } from './RosterLookups.ts';
import { readSeasonFile } from './readSeasonFile.ts';
import type { TableOptions, TableRead } from './readTable.ts';
import type { FieldingSeason } from './Roster.ts';

/**
 * Reads fielding.csv (one row per player, season, level, team and position)
 * as its column table says (fieldingColumns.ts), checks every row and
 * combines the stints of a player, season, level and position. Rows at P are
 * checked like the others, then left out (pitchers' fielding is not
 * profiled) and counted in `pitcherRows`.
 */
export async function readFielding(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly fielding: FieldingSeason[]; readonly pitcherRows: number }> {
  const { records, skippedRows, ...read } = await readSeasonFile(options, lookups, 'fielding.csv', FIELDING_COLUMNS, FIELDING_CHECKS);
  return { ...read, fielding: records, pitcherRows: skippedRows };
}
