import { stat } from 'node:fs/promises';
import { join } from 'node:path';
import type { InputIssue } from '../errors/InputError.ts';
import { HeaderColumns, type Column } from './HeaderColumns.ts';
import type { IssueLog } from './IssueLog.ts';
import { RowReader } from './RowReader.ts';
import { REQUIRED_FILES, type RosterFile } from './fileColumns.ts';
import { mapIssue, type ColumnMap } from './loadColumnMap.ts';
import { streamCsv } from './streamCsv.ts';

/** How often (in rows) progress is reported while a file is read. */
export const PROGRESS_EVERY = 100_000;

export interface TableOptions {
  readonly dir: string;
  readonly log: IssueLog;
  readonly columnMap: ColumnMap;
  readonly onProgress?: (file: string, rows: number) => void;
}

/** What a row handler is given once the header is known. */
export interface TableContext<F extends RosterFile> {
  readonly header: HeaderColumns<F>;
  readonly row: RowReader;
  /** The file's name as read (the club's name under a column map). */
  readonly fileName: string;
  /** Watches a percent column for values given as fractions (0 to 1) instead of 0 to 100. */
  watchPercent(col: Column): PercentWatch;
  /** Reports the row's issues (if any); true when the row is clean. */
  settle(): boolean;
}

export interface TableRead {
  readonly present: boolean;
  readonly fileName: string;
  readonly rows: number;
  readonly ignored: readonly string[];
  /** False when the file could not be read through (missing, header refused, CSV syntax or encoding). */
  readonly readable: boolean;
}

/**
 * Reads one roster file: locates its columns, hands each well-shaped row to
 * the handler that `setup` returns, reports ragged rows, CSV syntax errors and
 * percent columns given as fractions. A missing optional file reads as empty.
 */
export async function readTable<F extends RosterFile>(
  options: TableOptions,
  file: F,
  setup: (ctx: TableContext<F>) => (cells: readonly string[], line: number) => void,
): Promise<TableRead> {
  const { log, columnMap, onProgress } = options;
  const fileName = columnMap.files[file] ?? file;
  const path = join(options.dir, fileName);
  const renames = columnMap.columns[file] ?? {};
  if (!(await isFile(path))) {
    if (REQUIRED_FILES.has(file)) {
      const renamed = fileName === file
        ? ` (or name your export's file in a column map: --columns map.json with {"files": {"${file}": "<your file>"}})`
        : ` (the column map's name for ${file})`;
      log.fileProblem({
        code: 'kindred.input.missingFile', file: fileName, line: 0, column: 0, field: '', value: path,
        expected: `a file ${fileName} in the roster folder${file === 'levels.csv' ? ' declaring the roster’s levels under the header level, one a row, lowest first (the last is the top level)' : ''}${renamed}`,
      });
    } else if (columnMap.files[file] !== undefined || columnMap.columns[file] !== undefined) {
      const key = columnMap.files[file] !== undefined ? `files.${file}` : `columns.${file}`;
      const source = columnMap.source ?? { path: 'the column map', positions: new Map() };
      log.fileProblem(mapIssue(source, {
        key, value: fileName,
        expected: `a file the roster folder has (the map names ${file} as ${fileName}, which is not in ${options.dir})`,
      }));
    }
    return { present: false, fileName, rows: 0, ignored: [], readable: false };
  }

  const row = new RowReader(fileName);
  const watches: PercentWatch[] = [];
  let width = 0;
  let handle: ((cells: readonly string[], line: number) => void) | undefined;
  let ignored: readonly string[] = [];
  let seen = 0;
  const ctx = (header: HeaderColumns<F>): TableContext<F> => ({
    header,
    row,
    fileName,
    watchPercent(col) {
      const watch = new PercentWatch(fileName, col);
      watches.push(watch);
      return watch;
    },
    settle() {
      if (row.issues.length === 0) return true;
      log.rowProblems(fileName, row.line, row.cells, row.issues);
      return false;
    },
  });

  const { rows, syntax } = await streamCsv(path, fileName, {
    header(cells) {
      const header = new HeaderColumns(file, fileName, cells, renames);
      const rowHandler = setup(ctx(header));
      if (header.issues.length > 0) {
        for (const issue of header.issues) log.fileProblem(issue);
        return false;
      }
      for (const notice of header.notices) log.notice(notice);
      width = header.width;
      ignored = header.ignored();
      handle = rowHandler;
      return true;
    },
    record(cells, line) {
      if (handle === undefined) return;
      if (cells.length !== width) {
        row.start(line, cells);
        row.report('kindred.input.raggedRow', undefined, `${cells.length} cells`, `${width} cells, as many as the header`);
        log.rowProblems(fileName, line, cells, row.issues);
      } else {
        handle(cells, line);
      }
      seen += 1;
      if (onProgress !== undefined && seen % PROGRESS_EVERY === 0) onProgress(fileName, seen);
    },
  });
  if (syntax !== undefined) log.fileProblem(syntax);
  for (const watch of watches) {
    const issue = watch.issue();
    if (issue !== undefined) log.fileProblem(issue);
  }
  onProgress?.(fileName, rows);
  return { present: true, fileName, rows, ignored, readable: handle !== undefined && syntax === undefined };
}

async function isFile(path: string): Promise<boolean> {
  try {
    return (await stat(path)).isFile();
  } catch {
    return false;
  }
}

/**
 * Flags a percent column whose values all look like fractions: every
 * non-empty value at most 1.0 and at least one above 0 (e.g. 0.42 for 42%).
 */
export class PercentWatch {
  private allAtMostOne = true;
  private first: InputIssue | undefined;

  constructor(private readonly fileName: string, private readonly col: Column) {}

  see(value: number | undefined, line: number): void {
    if (value === undefined || !this.allAtMostOne) return;
    if (value > 1) {
      this.allAtMostOne = false;
    } else if (value > 0 && this.first === undefined) {
      this.first = {
        code: 'kindred.input.percentLooksLikeFraction',
        file: this.fileName,
        line,
        column: this.col.index + 1,
        field: this.col.name,
        value: String(value),
        expected: 'a percent 0 to 100 (every value of this column is at most 1: fractions, not percents?)',
      };
    }
  }

  issue(): InputIssue | undefined {
    return this.allAtMostOne ? this.first : undefined;
  }
}
