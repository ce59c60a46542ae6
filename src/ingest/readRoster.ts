import { InputError, type InputIssue } from '../errors/InputError.ts';
import { ISSUE_CAP, IssueLog } from './IssueLog.ts';
import { RosterLookups, defaultSeasonSpan, type SeasonSpan } from './RosterLookups.ts';
import { EMPTY_COLUMN_MAP, type ColumnMap } from './loadColumnMap.ts';
import { readBatting } from './readBatting.ts';
import { readContracts } from './readContracts.ts';
import { readFielding } from './readFielding.ts';
import { readLevels } from './readLevels.ts';
import { readPitching } from './readPitching.ts';
import { readPlayers } from './readPlayers.ts';
import type { TableOptions, TableRead } from './readTable.ts';
import type { RejectedRow, Roster } from './Roster.ts';

export type { ColumnMap } from './loadColumnMap.ts';

export interface ReadRosterOptions {
  /** Leave out bad rows (listed in `roster.rejected`) instead of failing. Default false: strict. */
  readonly lenient?: boolean;
  /** The club's file and column names (see loadColumnMap). */
  readonly columnMap?: ColumnMap;
  /** Seasons the roster may hold (default: 1860 to next year); a season outside is refused. */
  readonly seasons?: SeasonSpan;
  /** Called every 100,000 rows and at the end of each file with the file name as read and the rows so far. */
  readonly onProgress?: (file: string, rows: number) => void;
}

/**
 * Reads and checks a roster folder (players.csv, batting.csv; optional
 * fielding.csv, pitching.csv, contracts.csv, levels.csv).
 *
 * Strict (default): every problem is collected (the first 200 kept, the rest
 * counted) and one InputError carrying them is thrown. Lenient: rows with
 * problems are left out and listed in `rejected` with all their reasons;
 * problems of a whole file or column (missing file or column, wrong
 * delimiter, duplicate header names, CSV syntax, percents given as
 * fractions) still throw, and so does a lenient read that leaves no batting
 * or pitching row. No row is dropped silently.
 */
export async function readRoster(dir: string, options: ReadRosterOptions = {}): Promise<Roster> {
  const log = new IssueLog(options.lenient ?? false);
  const table: TableOptions = {
    dir,
    log,
    columnMap: options.columnMap ?? EMPTY_COLUMN_MAP,
    ...(options.onProgress === undefined ? {} : { onProgress: options.onProgress }),
  };
  const levels = await readLevels(table);
  const players = await readPlayers(table);
  const lookups = new RosterLookups(
    players.players, players.rejectedAt, players.fileName, levels.levels, levels.file, options.seasons ?? defaultSeasonSpan(), players.readable,
  );
  const batting = await readBatting(table, lookups);
  const fielding = await readFielding(table, lookups);
  const pitching = await readPitching(table, lookups);
  const contracts = await readContracts(table, lookups);
  log.throwIfFailed();
  if (batting.batting.length === 0 && pitching.pitching.length === 0 && log.rejected.length > 0) {
    throw nothingLeft(batting.fileName, pitching.fileName, log.rejected);
  }

  const reads: readonly [string, TableRead][] = [
    ['levels.csv', { present: levels.file !== undefined, fileName: levels.file ?? 'levels.csv', rows: levels.rows, ignored: levels.ignored, readable: true }],
    ['players.csv', { present: true, fileName: players.fileName, rows: players.rows, ignored: players.ignored, readable: players.readable }],
    ['batting.csv', batting],
    ['fielding.csv', fielding],
    ['pitching.csv', pitching],
    ['contracts.csv', contracts],
  ];
  const rowsRead: Record<string, number> = {};
  const ignoredColumns: Record<string, readonly string[]> = {};
  for (const [canonical, read] of reads) {
    if (!read.present) continue;
    rowsRead[canonical] = read.rows;
    if (read.ignored.length > 0) ignoredColumns[read.fileName] = read.ignored;
  }
  return {
    players: players.players,
    batting: batting.batting,
    fielding: fielding.fielding,
    pitching: pitching.pitching,
    contracts: contracts.contracts,
    levels: levels.levels,
    rowsRead,
    rejected: log.rejected,
    ignoredColumns,
    pitcherFieldingRows: fielding.pitcherRows,
    notices: [...(table.columnMap.notices ?? []), ...log.notices, ...emptyGroups(batting, fielding, pitching)],
  };
}

/** Lenient, yet every batting and pitching row was left out: nothing to profile. The first reasons are listed. */
function nothingLeft(battingFile: string, pitchingFile: string, rejected: readonly RejectedRow[]): InputError {
  const head: InputIssue = {
    code: 'kindred.input.nothingLeft', file: battingFile, line: 0, column: 0, field: '', value: `${rejected.length} rows rejected`,
    expected: `at least one good row in ${battingFile} or ${pitchingFile} (--lenient left out every row; no store is written)`,
  };
  const reasons = rejected.flatMap((r) => r.issues).slice(0, ISSUE_CAP - 1);
  return new InputError([head, ...reasons],
    `every row of ${battingFile} and ${pitchingFile} was rejected (${rejected.length} rows in all): nothing to build a store from`);
}

/** What the files leave empty, in words: a batting-only roster makes every hitter a DH. */
function emptyGroups(
  batting: TableRead & { readonly batting: readonly unknown[] },
  fielding: TableRead & { readonly fielding: readonly unknown[] },
  pitching: TableRead & { readonly pitching: readonly unknown[] },
): string[] {
  const none = (read: TableRead): string => (read.present ? `${read.fileName} has no usable rows` : `no ${read.fileName}`);
  const notices: string[] = [];
  if (batting.batting.length === 0) notices.push(`${none(batting)}: no hitter profiles (C, IF, OF, DH)`);
  else if (fielding.fielding.length === 0) {
    notices.push(`${none(fielding)}: every hitter is profiled as DH (no C, IF or OF profiles)`);
  }
  if (pitching.pitching.length === 0) notices.push(`${none(pitching)}: no pitcher profiles (SP, RP)`);
  return notices;
}
