import type { AtMostCheck, ColumnTable, RecordOf } from './ColumnSpec.ts';
import { RecordReader } from './RecordReader.ts';
import type { RosterLookups } from './RosterLookups.ts';
import { StintGroups } from './StintGroups.ts';
import { combineStints } from './combineStints.ts';
import type { RosterFile } from './fileColumns.ts';
import { readTable, type TableOptions, type TableRead } from './readTable.ts';

export interface SeasonFileRead<R> extends TableRead {
  /** One record per player-season key, stints combined. */
  readonly records: R[];
  /** Clean rows whose key part is a skipped value (fielding at P): checked, then left out. */
  readonly skippedRows: number;
}

/**
 * Reads a season file (one row per player, season, level, team and, for
 * fielding, position) as its column table says: checks every row, finds
 * duplicate stints, and combines the stints of each key (see combineStints).
 */
export async function readSeasonFile<T extends ColumnTable>(
  options: TableOptions,
  lookups: RosterLookups,
  file: RosterFile,
  table: T,
  checks: readonly AtMostCheck[],
): Promise<SeasonFileRead<RecordOf<T>>> {
  const describe = table.some((s) => s.kind === 'choice')
    ? 'player, season, level, team and position'
    : 'player, season, level and team';
  const groups = new StintGroups<RecordOf<T>>(describe);
  const skipped = new StintGroups<null>(describe);
  let skippedRows = 0;
  const read = await readTable(options, file, (ctx) => {
    const reader = new RecordReader(table, ctx, lookups, checks);
    const skippedValues: readonly string[] = reader.part?.spec.skipped ?? [];
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const fields = reader.read(line);
      const { team, partValue: part } = reader;
      const isSkipped = part !== undefined && skippedValues.includes(part);
      const key = (isSkipped ? skipped : groups).settleRow(row, {
        playerId: reader.playerId,
        season: reader.season,
        level: reader.level,
        team,
        ...(reader.part === undefined ? {} : { part: part ?? null }),
      }, () => ctx.settle());
      if (key === null) return;
      if (isSkipped) {
        skippedRows += 1;
        skipped.add(key, null, line, team ?? '');
        return;
      }
      groups.add(key, reader.record(fields), line, team ?? '');
    };
  });
  return { ...read, records: groups.collect((s) => s, (stints) => combineStints(table, stints)), skippedRows };
}
