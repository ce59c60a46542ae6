import { LEVELS_COLUMNS } from './levelsColumns.ts';
import { RecordReader } from './RecordReader.ts';
import { KeyLines } from './RosterLookups.ts';
import { readTable, type TableOptions } from './readTable.ts';

export interface LevelsRead {
  readonly levels: readonly string[];
  /** The file the order came from, undefined when the roster has none (reported as a missing file). */
  readonly file: string | undefined;
  readonly rows: number;
  readonly ignored: readonly string[];
}

/**
 * Reads levels.csv (levelsColumns.ts: one column `level`, rows low to high). There is no built-in
 * order: every roster declares its own levels, and its last (highest) level is the top level every
 * job speaks of. Without the file, readTable reports it missing and no level is known.
 */
export async function readLevels(options: TableOptions): Promise<LevelsRead> {
  const levels: string[] = [];
  const keys = new KeyLines('level');
  const read = await readTable(options, 'levels.csv', (ctx) => {
    const reader = new RecordReader(LEVELS_COLUMNS, ctx, undefined);
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const fields = reader.read(line);
      const level = typeof fields['level'] === 'string' ? fields['level'] : '';
      if (level !== '') keys.check(row, level, level);
      if (ctx.settle()) levels.push(reader.record(fields).level);
    };
  });
  if (!read.present) return { levels: [], file: undefined, rows: 0, ignored: [] };
  if (levels.length === 0 && read.rows === 0) {
    options.log.fileProblem({
      code: 'kindred.input.badValue', file: read.fileName, line: 2, column: 0, field: 'level', value: '',
      expected: 'at least one level (rows from lowest to highest)',
    });
  }
  return { levels, file: read.fileName, rows: read.rows, ignored: read.ignored };
}
