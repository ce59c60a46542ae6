import { BATTING_COLUMNS } from './battingColumns.ts';
import type { ColumnSpec, ColumnTable, CsvNameOf, PlausibleRange } from './ColumnSpec.ts';
import { CONTRACTS_COLUMNS } from './contractsColumns.ts';
import { FIELDING_COLUMNS } from './fieldingColumns.ts';
import { LEVELS_COLUMNS } from './levelsColumns.ts';
import { PITCHING_COLUMNS } from './pitchingColumns.ts';
import { PLAYERS_COLUMNS } from './playersColumns.ts';

/**
 * The canonical roster files and their column tables. A roster folder's
 * files are read under these names unless a column map renames them.
 */
export const FILE_COLUMNS = {
  'levels.csv': LEVELS_COLUMNS,
  'players.csv': PLAYERS_COLUMNS,
  'batting.csv': BATTING_COLUMNS,
  'fielding.csv': FIELDING_COLUMNS,
  'pitching.csv': PITCHING_COLUMNS,
  'contracts.csv': CONTRACTS_COLUMNS,
} as const satisfies Readonly<Record<string, ColumnTable>>;

export type RosterFile = keyof typeof FILE_COLUMNS;
export type ColumnOf<F extends RosterFile> = CsvNameOf<(typeof FILE_COLUMNS)[F]>;

export const ROSTER_FILES: readonly RosterFile[] = [
  'levels.csv', 'players.csv', 'batting.csv', 'fielding.csv', 'pitching.csv', 'contracts.csv',
];

/** Files a roster folder must have; the others are read as empty when absent. */
export const REQUIRED_FILES: ReadonlySet<RosterFile> = new Set<RosterFile>(['levels.csv', 'players.csv', 'batting.csv']);

/** The column table of a file (as a plain table, for code that works on any file). */
export function tableOf(file: RosterFile): ColumnTable {
  return FILE_COLUMNS[file];
}

/** The spec of a canonical column, undefined for a name the file lacks. */
export function columnSpec(file: RosterFile, csv: string): ColumnSpec | undefined {
  return tableOf(file).find((c) => c.csv === csv);
}

/** The current name of a column given by an earlier name of its own (ColumnSpec.formerly), undefined otherwise. */
export function renamedColumn(file: RosterFile, former: string): string | undefined {
  return tableOf(file).find((c) => c.formerly?.includes(former) === true)?.csv;
}

/** A file's earlier column names still read (ColumnSpec.formerly). */
export function formerColumnsOf(file: RosterFile): readonly string[] {
  return tableOf(file).flatMap((c) => c.formerly ?? []);
}

export function isRequiredColumn(file: RosterFile, column: string): boolean {
  return columnSpec(file, column)?.required ?? false;
}

/** A file's canonical column names: required first, then optional, each in table order. */
export function columnsOf(file: RosterFile): readonly string[] {
  const table = tableOf(file);
  return [...table.filter((c) => c.required), ...table.filter((c) => !c.required)].map((c) => c.csv);
}

/** The plausible range of a measured column; throws on a column without one (a programming error). */
export function plausibleRange(file: RosterFile, csv: string): PlausibleRange {
  const range = columnSpec(file, csv)?.range;
  if (range === undefined) throw new RangeError(`${file} has no measured column ${csv}`);
  return range;
}

/** The plausible range of a measured column of any roster file (dimension names reuse these CSV names), if it is one. */
export function measuredRange(csv: string): PlausibleRange | undefined {
  for (const file of ROSTER_FILES) {
    const range = columnSpec(file, csv)?.range;
    if (range !== undefined) return range;
  }
  return undefined;
}
