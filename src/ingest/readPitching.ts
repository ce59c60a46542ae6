import { PITCHING_CHECKS, PITCHING_COLUMNS } from './pitchingColumns.ts';
import type { RosterLookups } from './RosterLookups.ts';
import { readSeasonFile } from './readSeasonFile.ts';
import type { TableOptions, TableRead } from './readTable.ts';
import type { PitchingSeason } from './Roster.ts';

/**
 * Reads pitching.csv (one row per player, season, level and team) as its
 * column table says (pitchingColumns.ts), checks every row and combines the
 * stints of a player, season and level.
 */
export async function readPitching(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly pitching: PitchingSeason[] }> {
  const { records, ...read } = await readSeasonFile(options, lookups, 'pitching.csv', PITCHING_COLUMNS, PITCHING_CHECKS);
  return { ...read, pitching: records };
}
