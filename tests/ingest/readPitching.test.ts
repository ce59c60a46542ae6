import { afterAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import { col, csv, expectOneIssue, removeRosterDirs, rosterDir, strictIssues } from './rosterFixture.ts';

afterAll(removeRosterDirs);

async function pitchingIssues(rows: Parameters<typeof csv>[1]) {
  return (await strictIssues(rosterDir({ 'pitching.csv': csv('pitching', rows) }))).issues;
}

describe('readRoster: pitching.csv', () => {
  it('reads IP in thirds: "80.2" is 242 outs', async () => {
    const roster = await readRoster(rosterDir({ 'pitching.csv': csv('pitching', [{}]) }));
    expect(roster.pitching[0]?.outs).toBe(242);
  });
  it('refuses 6.3 innings pitched', async () => {
    const issues = await pitchingIssues([{ IP: '6.3' }]);
    expectOneIssue(issues, { code: 'kindred.input.badThirds', file: 'pitching.csv', line: 2, column: col('pitching', 'IP'), value: '6.3' });
  });
  it('refuses GS > G', async () => {
    const issues = await pitchingIssues([{ GS: '21' }]);
    expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'pitching.csv', line: 2, column: col('pitching', 'GS'), value: '21' });
  });
  it('refuses H > BF', async () => {
    const issues = await pitchingIssues([{ H: '341', HR: '8', BB: '0', HBP: '0', SO: '0' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'pitching.csv', line: 2, column: col('pitching', 'H'), value: '341' });
    expect(issue.expected).toContain('H <= BF');
  });
  it('refuses HR > H', async () => {
    const issues = await pitchingIssues([{ HR: '71' }]);
    expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'pitching.csv', line: 2, column: col('pitching', 'HR'), value: '71' });
  });
  it('refuses SO + BB + HBP > BF (negative balls in play)', async () => {
    const issues = await pitchingIssues([{ BF: '120', H: '10', HR: '1', SO: '100', BB: '20', HBP: '1' }]);
    expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'pitching.csv', line: 2, column: col('pitching', 'BF'), value: '120' });
  });
  it('refuses a fastball of 55 mph (60 to 110)', async () => {
    const issues = await pitchingIssues([{ fb_mph: '55' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'pitching.csv', line: 2, column: col('pitching', 'fb_mph'), value: '55' });
  });
  it('refuses a spin rate of 4500 rpm (500 to 4000)', async () => {
    const issues = await pitchingIssues([{ fb_spin_rpm: '4500' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'pitching.csv', line: 2, column: col('pitching', 'fb_spin_rpm'), value: '4500' });
  });
  it('refuses whiff_pct given as fractions', async () => {
    const issues = await pitchingIssues([{ whiff_pct: '0.25' }, { player_id: 'p2', whiff_pct: '0.31' }]);
    expectOneIssue(issues, { code: 'kindred.input.percentLooksLikeFraction', file: 'pitching.csv', line: 2, column: col('pitching', 'whiff_pct'), value: '0.25' });
  });
});
