import { afterAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import { col, csv, expectOneIssue, removeRosterDirs, rosterDir, strictIssues } from './rosterFixture.ts';

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
    expect(seen).toEqual([['players.csv', 3], ['batting.csv', 2]]);
  });
});
