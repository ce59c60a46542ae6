import { afterAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import { col, csv, expectOneIssue, PLAYER_ROWS, removeRosterDirs, rosterDir, strictIssues } from './rosterFixture.ts';

afterAll(removeRosterDirs);

async function playerIssues(rows: Parameters<typeof csv>[1]) {
  return (await strictIssues(rosterDir({ 'players.csv': csv('players', rows) }))).issues;
}

describe('readRoster: players.csv', () => {
  it('reads players with their optional fields', async () => {
    const roster = await readRoster(rosterDir());
    expect(roster.players.get('p3')).toEqual({ playerId: 'p3', name: 'Cy Placeholder', birthDate: '2000-01-01', bats: 'S', throws: 'L' });
  });
  it('refuses a bad date (not YYYY-MM-DD, or no such day)', async () => {
    const issues = await playerIssues([{ birth_date: '12/04/1998' }, { player_id: 'p2', birth_date: '1999-02-30' }, { player_id: 'p3' }]);
    const dates = issues.filter((i) => i.code === 'kindred.input.badDate');
    expect(dates.map((i) => [i.file, i.line, i.column, i.value])).toEqual([
      ['players.csv', 2, col('players', 'birth_date'), '12/04/1998'],
      ['players.csv', 3, col('players', 'birth_date'), '1999-02-30'],
    ]);
  });
  it('accepts 0001-01-01, a valid date of the proleptic Gregorian calendar (ISO 8601), and 2000-02-29 (leap year)', async () => {
    const roster = await readRoster(rosterDir({
      'players.csv': csv('players', [{ birth_date: '0001-01-01' }, { player_id: 'p2', birth_date: '2000-02-29' }, { player_id: 'p3' }]),
    }));
    expect(roster.players.get('p1')?.birthDate).toBe('0001-01-01');
    expect(roster.players.get('p2')?.birthDate).toBe('2000-02-29');
  });
  it('refuses a name holding an ESC sequence or a bidi override (U+202E), at file:line:column, the character shown as its code point', async () => {
    const issues = await playerIssues([{ name: 'Ann\u001b]0;owned\u0007' }, { player_id: 'p2', name: 'Bo \u202eelpmaS' }, PLAYER_ROWS[2] ?? {}]);
    const found = issues.filter((i) => i.code === 'kindred.input.controlCharacter');
    expect(found.map((i) => [i.file, i.line, i.column, i.value])).toEqual([
      ['players.csv', 2, col('players', 'name'), 'Ann<U+001B>]0;owned<U+0007>'],
      ['players.csv', 3, col('players', 'name'), 'Bo <U+202E>elpmaS'],
    ]);
    expect(found[0]?.expected).toContain('character 4 is U+001B');
  });
  it('refuses a header name holding a control character', async () => {
    const bad = (await strictIssues(rosterDir({ 'players.csv': 'player_id,name,x\u001b[2J\np1,Ann,1\n' }))).issues;
    expectOneIssue(bad, { code: 'kindred.input.controlCharacter', file: 'players.csv', line: 1, column: 3, value: 'x<U+001B>[2J' });
  });
  it('refuses bats not L, R or S', async () => {
    const issues = await playerIssues([{ bats: 'X' }, ...PLAYER_ROWS.slice(1)]);
    expectOneIssue(issues, { code: 'kindred.input.badValue', file: 'players.csv', line: 2, column: col('players', 'bats'), value: 'X' });
  });
  it('refuses throws not L or R (S is for bats only)', async () => {
    const issues = await playerIssues([{ throws: 'S' }, ...PLAYER_ROWS.slice(1)]);
    expectOneIssue(issues, { code: 'kindred.input.badValue', file: 'players.csv', line: 2, column: col('players', 'throws'), value: 'S' });
  });
  it('refuses a player_id listed twice', async () => {
    const issues = await playerIssues([...PLAYER_ROWS, { name: 'Ann Again' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.duplicateKey', file: 'players.csv', line: 5, column: 0, value: 'p1' });
    expect(issue.expected).toContain('line 2');
  });
  it('accepts a BOM at the start of the file: the first column is still found', async () => {
    const roster = await readRoster(rosterDir({ 'players.csv': '\ufeff' + csv('players', PLAYER_ROWS) }));
    expect([...roster.players.keys()]).toEqual(['p1', 'p2', 'p3']);
    expect(roster.ignoredColumns).toEqual({});
  });
});
