import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { afterAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import { writeRejects } from '../../src/ingest/writeRejects.ts';
import { csv, removeRosterDirs, rosterDir } from './rosterFixture.ts';

const out = mkdtempSync(join(tmpdir(), 'kindred-rejects-'));
afterAll(() => {
  rmSync(out, { recursive: true, force: true });
  removeRosterDirs();
});

describe('writeRejects(path, rejected)', () => {
  it('writes one CSV line per reason with the raw row, and leaves no temp file', async () => {
    const roster = await readRoster(rosterDir({
      'batting.csv': csv('batting', [{}, { player_id: 'p2', team: '"T,""2"""', H: '200', BB: '-3' }]),
    }), { lenient: true });
    const path = join(out, 'rejects.csv');
    await writeRejects(path, roster.rejected);
    const records: string[][] = parse(readFileSync(path, 'utf8'));
    expect(records[0]).toEqual(['file', 'line', 'column', 'field', 'value', 'code', 'expected', 'raw_row']);
    expect(records.slice(1).map((r) => r.slice(0, 6))).toEqual([
      ['batting.csv', '3', '12', 'BB', '-3', 'kindred.input.negative'],
      ['batting.csv', '3', '8', 'H', '200', 'kindred.input.inconsistent'],
    ]);
    const raw: string[][] = parse(records[1]?.[7] ?? '');
    expect(raw[0]?.slice(0, 4)).toEqual(['p2', '2021', 'AA', 'T,"2"']);
    expect(readdirSync(out)).toEqual(['rejects.csv']);
  });
  it('writes text cells that begin with = + - @ as text, apostrophe first (OWASP CSV injection guidance)', async () => {
    const roster = await readRoster(rosterDir({
      'batting.csv': csv('batting', [{}, { player_id: '=HYPERLINK(1)', team: '@SUM(A1)' }]),
    }), { lenient: true });
    const path = join(out, 'formula.csv');
    await writeRejects(path, roster.rejected);
    const records: string[][] = parse(readFileSync(path, 'utf8'));
    expect(records[1]?.slice(3, 5)).toEqual(['player_id', "'=HYPERLINK(1)"]);
    expect(records[1]?.[7]?.startsWith("'=HYPERLINK(1),2021,AA,@SUM(A1),")).toBe(true);
  });
  it('ends the raw row of a long rejected row with a cell saying how many cells were not kept', async () => {
    const wide = Array.from({ length: 100 }, (_, i) => String(i)).join(',');
    const roster = await readRoster(rosterDir({ 'batting.csv': `${csv('batting', [{}])}${wide}\n` }), { lenient: true });
    const path = join(out, 'wide.csv');
    await writeRejects(path, roster.rejected);
    const records: string[][] = parse(readFileSync(path, 'utf8'));
    const raw: string[][] = parse(records[1]?.[7] ?? '');
    expect(raw[0]?.length).toBe(65);
    expect(raw[0]?.[64]).toBe('... 36 more cells not kept');
  });
  it('writes only the header when nothing was rejected', async () => {
    const path = join(out, 'none.csv');
    await writeRejects(path, []);
    expect(readFileSync(path, 'utf8').trim()).toBe('file,line,column,field,value,code,expected,raw_row');
  });
});
