import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import { col, csv, expectOneIssue, PLAYER_ROWS, removeRosterDirs, rosterDir, strictIssues } from './rosterFixture.ts';

afterAll(removeRosterDirs);

describe('readRoster: file shape', () => {
  it('accepts a BOM before the header of batting.csv: player_id is still the first column', async () => {
    const roster = await readRoster(rosterDir({ 'batting.csv': '\ufeff' + csv('batting', [{}]) }));
    expect(roster.batting.map((b) => b.playerId)).toEqual(['p1']);
  });
  it('refuses a semicolon-separated file, expecting comma-separated columns', async () => {
    const text = csv('batting', [{}]).replaceAll(',', ';');
    const { issues } = await strictIssues(rosterDir({ 'batting.csv': text }));
    const issue = expectOneIssue(issues, { code: 'kindred.input.wrongDelimiter', file: 'batting.csv', line: 1, column: 0, value: text.split('\n')[0] ?? '' });
    expect(issue.expected).toContain('comma-separated');
    expect(issues).toHaveLength(1);
  });
  it('refuses a tab-separated file', async () => {
    const text = csv('batting', [{}]).replaceAll(',', '\t');
    const { issues } = await strictIssues(rosterDir({ 'batting.csv': text }));
    expect(issues.map((i) => i.code)).toEqual(['kindred.input.wrongDelimiter']);
  });
  it('refuses ragged rows (more or fewer cells than the header) at their lines', async () => {
    const lines = csv('batting', [{}, { player_id: 'p2' }, { player_id: 'p3' }]).trimEnd().split('\n');
    const text = [lines[0], lines[1], `${lines[2]},extra`, (lines[3] ?? '').split(',').slice(0, 5).join(',')].join('\n');
    const { issues } = await strictIssues(rosterDir({ 'batting.csv': text }));
    const width = (lines[0] ?? '').split(',').length;
    expect(issues.map((i) => [i.code, i.file, i.line, i.column, i.value])).toEqual([
      ['kindred.input.raggedRow', 'batting.csv', 3, 0, `${width + 1} cells`],
      ['kindred.input.raggedRow', 'batting.csv', 4, 0, '5 cells'],
    ]);
  });
  it('counts lines past quoted line breaks and empty lines', async () => {
    const text = 'player_id,name\np1,"Ann\nExample"\n\np2,Bo Sample\np3,Cy Placeholder,oops\n';
    const { issues } = await strictIssues(rosterDir({ 'players.csv': text }));
    expectOneIssue(issues, { code: 'kindred.input.raggedRow', file: 'players.csv', line: 6, column: 0, value: '3 cells' });
  });
  it('reads CRLF line endings and counts lines the same way', async () => {
    const text = csv('batting', [{}, { player_id: 'p2' }, { player_id: 'p3', AB: 'x' }]).replaceAll('\n', '\r\n');
    const { issues } = await strictIssues(rosterDir({ 'batting.csv': text }));
    expectOneIssue(issues, { code: 'kindred.input.notNumeric', file: 'batting.csv', line: 4, column: col('batting', 'AB'), value: 'x' });
  });
  it('refuses a missing required column at column 0, naming it', async () => {
    const { issues } = await strictIssues(rosterDir({ 'batting.csv': csv('batting', [{}], ['SF']) }));
    const issue = expectOneIssue(issues, { code: 'kindred.input.missingColumn', file: 'batting.csv', line: 1, column: 0, value: 'SF', field: 'SF' });
    expect(issue.expected).toContain('SF');
  });
  it('refuses duplicate header names (CSV readers silently keep the last)', async () => {
    const text = csv('batting', [{}]).replace('\n', ',H\n').replace(/\n(.+)\n/, (_m, row: string) => `\n${row},31\n`);
    const { issues } = await strictIssues(rosterDir({ 'batting.csv': text }));
    const width = csv('batting', []).trim().split(',').length;
    const issue = expectOneIssue(issues, { code: 'kindred.input.duplicateColumn', file: 'batting.csv', line: 1, column: width + 1, value: 'H' });
    expect(issue.expected).toContain(`column ${col('batting', 'H')}`);
  });
  it('refuses an unclosed quote as a CSV syntax error at its line', async () => {
    const text = 'player_id,name\np1,Ann Example\np2,"Bo Sample\np3,Cy\n';
    const { issues } = await strictIssues(rosterDir({ 'players.csv': text }));
    const syntax = issues.filter((i) => i.code === 'kindred.input.csvSyntax');
    expect(syntax).toHaveLength(1);
    expect(syntax[0]?.file).toBe('players.csv');
    expect(syntax[0]?.line).toBeGreaterThanOrEqual(3);
  });
  it('refuses a roster without players.csv or batting.csv', async () => {
    const dir = rosterDir({ 'players.csv': '' });
    const { issues } = await strictIssues(dir);
    expectOneIssue(issues, { code: 'kindred.input.badHeader', file: 'players.csv', line: 1, column: 0, value: '' });
    const { rmSync } = await import('node:fs');
    rmSync(`${dir}/batting.csv`);
    const again = await strictIssues(dir);
    expect(again.issues.map((i) => [i.code, i.file])).toContainEqual(['kindred.input.missingFile', 'batting.csv']);
  });
  it('ignores unknown extra columns and lists them on the roster', async () => {
    const text = csv('batting', [{}]).replace('\n', ',club_note,\n').replace(/\n(.+)\n/, (_m, row: string) => `\n${row},fine,\n`);
    const roster = await readRoster(rosterDir({ 'batting.csv': text }));
    expect(roster.ignoredColumns).toEqual({ 'batting.csv': ['club_note'] });
    expect(roster.batting).toHaveLength(1);
  });
  it('reports progress with the rows read at the end of each file', async () => {
    const seen: [string, number][] = [];
    await readRoster(rosterDir({ 'batting.csv': csv('batting', [{}, { player_id: 'p2' }]) }), { onProgress: (f, n) => seen.push([f, n]) });
    expect(seen).toEqual([['levels.csv', 6], ['players.csv', 3], ['batting.csv', 2]]);
  });
});

/** A roster whose players.csv holds the given bytes. */
function playersBytes(bytes: Buffer): string {
  const dir = rosterDir();
  writeFileSync(join(dir, 'players.csv'), bytes);
  return dir;
}

// Sources: RFC 3629 (UTF-8: 0xE9 alone is not a valid sequence), the Unicode Standard on UTF-16 and its
// byte order mark (FF FE little-endian, FE FF big-endian).
describe('readRoster: text encoding', () => {
  it('refuses invalid UTF-8 with one error naming the file and line (Latin-1 "é" as byte E9), not a replacement character', async () => {
    const text = Buffer.concat([Buffer.from('player_id,name\np1,Ann Example\np2,Ren'), Buffer.from([0xe9]), Buffer.from('e Sample\np3,Cy\n')]);
    const { issues } = await strictIssues(playersBytes(text));
    const issue = expectOneIssue(issues, { code: 'kindred.input.badEncoding', file: 'players.csv', line: 3, column: 0, value: 'bytes E9 65 20 53' });
    expect(issue.expected).toContain('UTF-8');
    expect(issues).toHaveLength(1);
  });
  it.each([
    ['with a byte order mark (little-endian)', Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(csv('players', PLAYER_ROWS), 'utf16le')]), 'little-endian'],
    ['without a byte order mark (little-endian)', Buffer.from(csv('players', PLAYER_ROWS), 'utf16le'), 'little-endian'],
    ['without a byte order mark (big-endian)', Buffer.from(csv('players', PLAYER_ROWS), 'utf16le').swap16(), 'big-endian'],
  ])('refuses UTF-16 %s with one line saying the encoding', async (_what, bytes, kind) => {
    const { issues } = await strictIssues(playersBytes(bytes));
    expect(issues.map((i) => [i.code, i.file, i.line])).toEqual([['kindred.input.badEncoding', 'players.csv', 1]]);
    expect(issues[0]?.expected).toContain(`UTF-16, ${kind}`);
  });
  it('reads multi-byte UTF-8 names, also when a character is split across read chunks (64 KiB)', async () => {
    const names = Array.from({ length: 8000 }, (_, i) => `p${i + 1},Zoë Ñandú 山田 ${i}`);
    const roster = await readRoster(playersBytes(Buffer.from(['player_id,name', ...names].join('\n') + '\n')));
    expect(roster.players.size).toBe(8000);
    expect(roster.players.get('p7999')?.name).toBe('Zoë Ñandú 山田 7998');
  });
});

