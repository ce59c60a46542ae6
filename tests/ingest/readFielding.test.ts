import { afterAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import { col, csv, expectOneIssue, removeRosterDirs, rosterDir, strictIssues } from './rosterFixture.ts';

afterAll(removeRosterDirs);

async function fieldingIssues(rows: Parameters<typeof csv>[1]) {
  return (await strictIssues(rosterDir({ 'fielding.csv': csv('fielding', rows) }))).issues;
}

describe('readRoster: fielding.csv', () => {
  it('reads innings in thirds: "200.1" is 601 outs', async () => {
    const roster = await readRoster(rosterDir({ 'fielding.csv': csv('fielding', [{}]) }));
    expect(roster.fielding[0]?.outs).toBe(601);
  });
  it('refuses 6.3 innings and 6.25 innings', async () => {
    const issues = await fieldingIssues([{ inn: '6.3' }, { player_id: 'p2', inn: '6.25' }]);
    const thirds = issues.filter((i) => i.code === 'kindred.input.badThirds');
    expect(thirds.map((i) => [i.line, i.column, i.value])).toEqual([
      [2, col('fielding', 'inn'), '6.3'],
      [3, col('fielding', 'inn'), '6.25'],
    ]);
    expect(thirds[0]?.expected).toContain('a whole number of innings, optionally .1 or .2');
  });
  it('refuses cs_caught > sb_against', async () => {
    const issues = await fieldingIssues([{ cs_caught: '41' }]);
    expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'fielding.csv', line: 2, column: col('fielding', 'cs_caught'), value: '41' });
  });
  it('refuses a pop time of 1.2 s (1.5 to 3.0)', async () => {
    const issues = await fieldingIssues([{ pop_2b_s: '1.2' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'fielding.csv', line: 2, column: col('fielding', 'pop_2b_s'), value: '1.2' });
  });
  it('refuses an exchange of 2.0 s (0.4 to 1.5)', async () => {
    const issues = await fieldingIssues([{ exchange_s: '2.0' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'fielding.csv', line: 2, column: col('fielding', 'exchange_s'), value: '2.0' });
  });
  it('refuses an arm of 120 mph (40 to 110)', async () => {
    const issues = await fieldingIssues([{ arm_mph: '120' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'fielding.csv', line: 2, column: col('fielding', 'arm_mph'), value: '120' });
  });
  it('refuses an unknown position', async () => {
    const issues = await fieldingIssues([{ pos: 'DH' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.badValue', file: 'fielding.csv', line: 2, column: col('fielding', 'pos'), value: 'DH' });
    expect(issue.expected).toContain('C, 1B, 2B, 3B, SS, LF, CF, RF');
  });
  it('refuses two rows with the same player, season, level, team and position, naming both lines', async () => {
    const issues = await fieldingIssues([{}, { pos: '1B' }, { PO: '3' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.duplicateKey', file: 'fielding.csv', line: 4, column: 0, value: 'p1 2021 AA T1 C' });
    expect(issue.expected).toContain('line 2');
  });
  it('checks rows at P, then skips them and counts them in pitcherFieldingRows', async () => {
    const roster = await readRoster(rosterDir({
      'fielding.csv': csv('fielding', [{}, { player_id: 'p3', pos: 'P' }, { player_id: 'p3', pos: 'P', level: 'AAA' }]),
    }));
    expect(roster.fielding.map((f) => f.pos)).toEqual(['C']);
    expect(roster.pitcherFieldingRows).toBe(2);
    expect(roster.rowsRead['fielding.csv']).toBe(3);
    const issues = await fieldingIssues([{ player_id: 'p3', pos: 'P', E: '-1' }]);
    expectOneIssue(issues, { code: 'kindred.input.negative', file: 'fielding.csv', line: 2, column: col('fielding', 'E'), value: '-1' });
  });
  it('reads a roster without fielding.csv and pitching.csv as having none', async () => {
    const roster = await readRoster(rosterDir());
    expect(roster.fielding).toEqual([]);
    expect(roster.pitching).toEqual([]);
    expect(roster.contracts).toEqual([]);
    expect(Object.keys(roster.rowsRead).sort()).toEqual(['batting.csv', 'levels.csv', 'players.csv']);
  });
});
