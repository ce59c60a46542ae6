import { readFile } from 'node:fs/promises';
import { parse } from 'csv-parse/sync';
import { InputError, type InputIssue } from '../../errors/InputError.ts';

export interface BatchTarget {
  readonly line: number;
  readonly playerId: string;
  readonly season: number | undefined;
  readonly level: string | undefined;
}

/**
 * Targets for --batch: a CSV with a player_id column and optional season and level columns, one
 * target per row, answered in the order given. Problems are reported as file:line:column.
 */
export async function readTargets(path: string): Promise<BatchTarget[]> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (e) {
    throw new InputError([{ code: 'kindred.input.missingFile', file: path, line: 0, column: 0, field: '', value: path, expected: `a readable targets file (${e instanceof Error ? e.message : String(e)})` }]);
  }
  let rows: string[][];
  try {
    rows = parse(text, { bom: true, delimiter: ',', relax_column_count: true, skip_empty_lines: true, trim: true });
  } catch (e) {
    throw new InputError([{ code: 'kindred.input.csvSyntax', file: path, line: 0, column: 0, field: '', value: '', expected: `valid CSV (${e instanceof Error ? e.message : String(e)})` }]);
  }
  const header = rows[0] ?? [];
  const col = (name: string): number => header.indexOf(name);
  const issues: InputIssue[] = [];
  if (col('player_id') < 0) {
    issues.push({ code: 'kindred.input.missingColumn', file: path, line: 1, column: 0, field: 'player_id', value: header.join(','), expected: 'a header with player_id (and optionally season, level)' });
    throw new InputError(issues);
  }
  const targets: BatchTarget[] = [];
  rows.slice(1).forEach((row, i) => {
    const line = i + 2;
    const get = (name: string): string | undefined => {
      const c = col(name);
      const v = c >= 0 ? row[c] : undefined;
      return v === undefined || v === '' ? undefined : v;
    };
    const seasonText = get('season');
    if (seasonText !== undefined && !/^\d{4}$/.test(seasonText)) {
      issues.push({ code: 'kindred.input.badValue', file: path, line, column: col('season') + 1, field: 'season', value: seasonText, expected: 'a four-digit season' });
      return;
    }
    const playerId = get('player_id');
    if (playerId === undefined) {
      issues.push({ code: 'kindred.input.badValue', file: path, line, column: col('player_id') + 1, field: 'player_id', value: '', expected: 'a player id' });
      return;
    }
    targets.push({ line, playerId, season: seasonText === undefined ? undefined : Number(seasonText), level: get('level') });
  });
  if (issues.length > 0) throw new InputError(issues);
  return targets;
}
