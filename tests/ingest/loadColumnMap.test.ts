import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { formatIssue, InputError } from '../../src/errors/InputError.ts';
import { loadColumnMap } from '../../src/ingest/loadColumnMap.ts';

const dir = mkdtempSync(join(tmpdir(), 'kindred-map-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

let n = 0;
function mapFile(text: string): string {
  n += 1;
  const path = join(dir, `map${n}.json`);
  writeFileSync(path, text);
  return path;
}

async function mapError(text: string): Promise<InputError> {
  const err = await loadColumnMap(mapFile(text)).then(() => undefined, (e: unknown) => e);
  if (!(err instanceof InputError)) throw new Error(`expected an InputError, got ${String(err)}`);
  expect(err.code).toBe('kindred.input.badColumnMap');
  return err;
}

describe('loadColumnMap(path)', () => {
  it('reads file and column renames, both parts optional', async () => {
    const map = await loadColumnMap(mapFile(JSON.stringify({
      files: { 'batting.csv': 'their_batting.csv' },
      columns: { 'batting.csv': { PA: 'plate_app' } },
    })));
    expect(map).toMatchObject({ files: { 'batting.csv': 'their_batting.csv' }, columns: { 'batting.csv': { PA: 'plate_app' } } });
    expect(map.source?.positions.get('columns.batting.csv.PA')).toEqual({ line: 1, column: 72 });
    expect(await loadColumnMap(mapFile('{}'))).toMatchObject({ files: {}, columns: {} });
  });
  it('reads a key given under a column\'s former name (sprint_ft_s) as the current one, with a notice', async () => {
    const map = await loadColumnMap(mapFile(JSON.stringify({ columns: { 'batting.csv': { sprint_ft_s: 'speed' } } })));
    expect(map.columns).toEqual({ 'batting.csv': { run_speed_ft_s: 'speed' } });
    expect(map.notices).toEqual([expect.stringMatching(/: key sprint_ft_s of batting.csv read as run_speed_ft_s, its new name \(rename the key to run_speed_ft_s\)$/)]);
  });
  it('refuses a column given under both its names, naming the former key', async () => {
    const err = await mapError(JSON.stringify({ columns: { 'batting.csv': { sweet_spot_pct: 'a', la_band_pct: 'b' } } }));
    expect(err.issues[0]?.field).toBe('columns.batting.csv.sweet_spot_pct');
    expect(err.issues[0]?.expected).toContain('former name of la_band_pct');
  });
  it('refuses an unknown canonical column, naming the key', async () => {
    const err = await mapError(JSON.stringify({ columns: { 'batting.csv': { PAA: 'plate_app' } } }));
    expect(err.message).toContain('columns.batting.csv.PAA');
    expect(err.issues[0]?.field).toBe('columns.batting.csv.PAA');
  });
  it('refuses an unknown file name and an unknown top-level key', async () => {
    const err = await mapError(JSON.stringify({ files: { 'hitting.csv': 'x.csv' }, extra: 1 }));
    const fields = err.issues.map((i) => i.field);
    expect(fields).toContain('files.hitting.csv');
    expect(fields).toContain('extra');
  });
  it('refuses an empty name and a name that is not a string', async () => {
    const err = await mapError(JSON.stringify({ columns: { 'batting.csv': { PA: '', AB: 7 } } }));
    expect(err.issues.map((i) => i.field).sort()).toEqual(['columns.batting.csv.AB', 'columns.batting.csv.PA']);
    // the refused value as the map wrote it (7), not an empty one
    expect(err.issues.find((i) => i.field === 'columns.batting.csv.AB')?.value).toBe('7');
  });
  it('refuses two canonical columns mapped to one club column', async () => {
    const err = await mapError(JSON.stringify({ columns: { 'batting.csv': { H: 'hits', HR: 'hits' } } }));
    expect(err.message).toContain('columns.batting.csv.HR');
  });
  it('refuses text that is not JSON', async () => {
    const err = await mapError('{ files: ');
    expect(err.message).toContain('expected valid JSON');
    expect(err.issues[0]).toMatchObject({ line: 1, column: 3 });
  });
  it('refuses a canonical column mapped to the column another canonical column reads (SO -> BB), at its line', async () => {
    const err = await mapError('{\n  "columns": {\n    "batting.csv": { "SO": "BB" }\n  }\n}\n');
    const issue = err.issues[0];
    expect(issue).toMatchObject({ field: 'columns.batting.csv.SO', value: 'BB', line: 3, column: 22 });
    expect(issue?.expected).toContain('where BB itself is read');
  });
  it('accepts swapping two columns (SO -> BB and BB -> SO): each reads a column of its own', async () => {
    const map = await loadColumnMap(mapFile(JSON.stringify({ columns: { 'batting.csv': { SO: 'BB', BB: 'SO' } } })));
    expect(map.columns['batting.csv']).toEqual({ SO: 'BB', BB: 'SO' });
  });
  it('words its errors as what was expected, located at a line and column, never "expected unknown key" or ":0:0:"', async () => {
    const err = await mapError('{"columns": {"batting.csv": {"PAA": "x"}}}');
    const text = formatIssue(err.issues[0] ?? { code: 'kindred.input.badColumnMap', file: '', line: 0, column: 0, field: '', value: '', expected: '' });
    expect(text).toMatch(/map\d+\.json:1:30: columns\.batting\.csv\.PAA "PAA": expected a column of batting\.csv: one of player_id, /);
    expect(text).not.toContain('expected unknown key');
    const bad = await mapError('{\n  "files": \n}');
    expect(bad.issues[0]?.line).toBe(3);
    expect(formatIssue(bad.issues[0] ?? { code: 'kindred.input.badColumnMap', file: '', line: 0, column: 0, field: '', value: '', expected: '' })).not.toContain(':0:0:');
  });
});

