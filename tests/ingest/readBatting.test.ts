import { afterAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import { col, csv, expectOneIssue, FIXTURE_LEVELS, PLAYER_ROWS, removeRosterDirs, rosterDir, strictIssues } from './rosterFixture.ts';

afterAll(removeRosterDirs);

/** Issues of a roster whose batting.csv has the given rows (line 2 is the first). */
async function battingIssues(rows: Parameters<typeof csv>[1], omit: readonly string[] = []) {
  return (await strictIssues(rosterDir({ 'batting.csv': csv('batting', rows, omit) }))).issues;
}

describe('readRoster: batting.csv counts', () => {
  it('refuses a non-numeric count ("12abc" is not 12)', async () => {
    const issues = await battingIssues([{}, { H: '12abc' }]);
    expectOneIssue(issues, { code: 'kindred.input.notNumeric', file: 'batting.csv', line: 3, column: col('batting', 'H'), value: '12abc', field: 'H' });
  });
  it('refuses a negative count', async () => {
    const issues = await battingIssues([{ BB: '-3' }]);
    expectOneIssue(issues, { code: 'kindred.input.negative', file: 'batting.csv', line: 2, column: col('batting', 'BB'), value: '-3' });
  });
  it('refuses a non-integer count', async () => {
    const issues = await battingIssues([{ SO: '2.5' }]);
    expectOneIssue(issues, { code: 'kindred.input.notInteger', file: 'batting.csv', line: 2, column: col('batting', 'SO'), value: '2.5' });
  });
  it('reads "007" as 7 and leaves an empty optional cell undefined, never zero', async () => {
    const roster = await readRoster(rosterDir({ 'batting.csv': csv('batting', [{ HR: '007', SB: '', ev_avg_mph: '' }]) }));
    const season = roster.batting[0];
    expect(season?.HR).toBe(7);
    expect(season?.SB).toBeUndefined();
    expect(season?.evAvgMph).toBeUndefined();
    expect(season !== undefined && 'SB' in season).toBe(false);
  });
  it('refuses an empty cell in a required column', async () => {
    const issues = await battingIssues([{ PA: '' }]);
    expectOneIssue(issues, { code: 'kindred.input.badValue', file: 'batting.csv', line: 2, column: col('batting', 'PA'), value: '' });
  });
});

describe('readRoster: batting.csv consistency', () => {
  it('refuses H > AB', async () => {
    const issues = await battingIssues([{ H: '110', AB: '105' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'batting.csv', line: 2, column: col('batting', 'H'), value: '110' });
    expect(issue.expected).toContain('H <= AB');
  });
  it('refuses 2B + 3B + HR > H', async () => {
    const issues = await battingIssues([{ H: '10', '2B': '6', '3B': '2', HR: '4' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'batting.csv', line: 2, column: col('batting', 'H'), value: '10' });
    expect(issue.expected).toContain('2B + 3B + HR <= H (here 12 > 10)');
  });
  it('refuses AB + BB + HBP + SF > PA', async () => {
    const issues = await battingIssues([{ PA: '119' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'batting.csv', line: 2, column: col('batting', 'PA'), value: '119' });
    expect(issue.expected).toContain('AB + BB + HBP + SF <= PA (here 120 > 119)');
  });
  it('refuses SO > PA', async () => {
    // AB + BB + HBP + SF stays at most PA, so only SO > PA is wrong.
    const issues = await battingIssues([{ PA: '20', AB: '20', H: '0', '2B': '0', '3B': '0', HR: '0', BB: '0', IBB: '0', HBP: '0', SF: '0', SO: '21', bbe: '0' }]);
    expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'batting.csv', line: 2, column: col('batting', 'SO'), value: '21' });
  });
  it('refuses IBB > BB', async () => {
    const issues = await battingIssues([{ IBB: '11' }]);
    expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'batting.csv', line: 2, column: col('batting', 'IBB'), value: '11' });
  });
  it('refuses bbe > PA', async () => {
    const issues = await battingIssues([{ bbe: '121' }]);
    expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'batting.csv', line: 2, column: col('batting', 'bbe'), value: '121' });
  });
});

describe('readRoster: batting.csv measurements (plausible ranges)', () => {
  it('refuses an average exit velocity of 130 mph (40 to 120)', async () => {
    const issues = await battingIssues([{ ev_avg_mph: '130', ev_p90_mph: '' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'batting.csv', line: 2, column: col('batting', 'ev_avg_mph'), value: '130' });
  });
  it('refuses a 90th percentile exit velocity of 126 mph (40 to 125)', async () => {
    const issues = await battingIssues([{ ev_p90_mph: '126' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'batting.csv', line: 2, column: col('batting', 'ev_p90_mph'), value: '126' });
  });
  it('refuses ev_p90_mph below ev_avg_mph', async () => {
    const issues = await battingIssues([{ ev_avg_mph: '95', ev_p90_mph: '90' }]);
    expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'batting.csv', line: 2, column: col('batting', 'ev_p90_mph'), value: '90' });
  });
  it('refuses a launch angle of -95 degrees (-90 to 90)', async () => {
    const issues = await battingIssues([{ la_avg_deg: '-95' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'batting.csv', line: 2, column: col('batting', 'la_avg_deg'), value: '-95' });
  });
  it('refuses a run speed of 40 ft/s (15 to 35)', async () => {
    const issues = await battingIssues([{ run_speed_ft_s: '40' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'batting.csv', line: 2, column: col('batting', 'run_speed_ft_s'), value: '40' });
  });
  it('refuses a percent above 100', async () => {
    const issues = await battingIssues([{ hard_hit_pct: '101' }]);
    expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'batting.csv', line: 2, column: col('batting', 'hard_hit_pct'), value: '101' });
  });
  it('refuses a percent column whose values all look like fractions, at its first such cell', async () => {
    const issues = await battingIssues([
      { hard_hit_pct: '' },
      { player_id: 'p2', hard_hit_pct: '0' },
      { player_id: 'p3', hard_hit_pct: '0.42' },
      { player_id: 'p1', level: 'AAA', hard_hit_pct: '0.38' },
    ]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.percentLooksLikeFraction', file: 'batting.csv', line: 4, column: col('batting', 'hard_hit_pct'), value: '0.42' });
    expect(issue.expected).toContain('0 to 100');
  });
  it('accepts small percents when another value of the column is above 1', async () => {
    const roster = await readRoster(rosterDir({ 'batting.csv': csv('batting', [{ la_band_pct: '0.5' }, { player_id: 'p2', la_band_pct: '31' }]) }));
    expect(roster.batting.map((b) => b.laBandPct)).toEqual([0.5, 31]);
  });
});

describe('readRoster: batting.csv keys', () => {
  it('refuses a season that is not a 4-digit year', async () => {
    const issues = await battingIssues([{ season: '21' }]);
    expectOneIssue(issues, { code: 'kindred.input.badValue', file: 'batting.csv', line: 2, column: col('batting', 'season'), value: '21' });
  });
  it('refuses a season outside the plausible span (9999), and one outside a span given when reading', async () => {
    const issues = await battingIssues([{ season: '9999' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.outOfRange', file: 'batting.csv', line: 2, column: col('batting', 'season'), value: '9999' });
    expect(issue.expected).toMatch(/a season from 1860 to \d{4}/);
    const narrow = await strictIssues(rosterDir({ 'batting.csv': csv('batting', [{}]) }), { seasons: { from: 2022, to: 2030 } });
    expectOneIssue(narrow.issues, { code: 'kindred.input.outOfRange', file: 'batting.csv', line: 2, column: col('batting', 'season'), value: '2021' });
  });
  it('refuses a season that does not come after the birth date in players.csv (born 2090, season 2021)', async () => {
    const dir = rosterDir({
      'players.csv': csv('players', [{ birth_date: '2090-01-01' }, ...PLAYER_ROWS.slice(1)]),
      'batting.csv': csv('batting', [{}]),
    });
    const { issues } = await strictIssues(dir);
    const issue = expectOneIssue(issues, { code: 'kindred.input.inconsistent', file: 'batting.csv', line: 2, column: col('batting', 'season'), value: '2021' });
    expect(issue.expected).toContain('born 2090-01-01');
  });
  it('refuses an unknown level, naming the known levels and levels.csv', async () => {
    const issues = await battingIssues([{ level: 'AAAA' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.badValue', file: 'batting.csv', line: 2, column: col('batting', 'level'), value: 'AAAA' });
    expect(issue.expected).toContain(FIXTURE_LEVELS.join(', '));
    expect(issue.expected).toContain('levels.csv');
  });
  it('refuses a player_id that is not in players.csv', async () => {
    const issues = await battingIssues([{ player_id: 'p9' }]);
    expectOneIssue(issues, { code: 'kindred.input.unknownPlayer', file: 'batting.csv', line: 2, column: col('batting', 'player_id'), value: 'p9' });
  });
  it('refuses two rows with the same player, season, level and team, naming both lines', async () => {
    const issues = await battingIssues([{}, { player_id: 'p2' }, { H: '29' }]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.duplicateKey', file: 'batting.csv', line: 4, column: 0, value: 'p1 2021 AA T1' });
    expect(issue.expected).toContain('line 2');
    expect(issue.expected).toContain('line 4');
  });
  it('still reports a duplicate of a row that was refused for another reason', async () => {
    const issues = await battingIssues([{ H: 'x' }, { player_id: 'p2' }, {}]);
    const issue = expectOneIssue(issues, { code: 'kindred.input.duplicateKey', file: 'batting.csv', line: 4, column: 0, value: 'p1 2021 AA T1' });
    expect(issue.expected).toContain('line 2');
  });
  it('reads stints of one season at two teams as one season, but a second row of the same team as a duplicate', async () => {
    const roster = await readRoster(rosterDir({ 'batting.csv': csv('batting', [{}, { team: 'T2' }]) }));
    expect(roster.batting).toHaveLength(1);
    expect(roster.batting[0]?.teams).toEqual(['T1', 'T2']);
    expect(roster.batting[0]?.PA).toBe(240);
  });
});

describe('readRoster: batting.csv columns under their former names', () => {
  // Project choice: la_band_pct and run_speed_ft_s were called sweet_spot_pct and sprint_ft_s; an export
  // made for the old names still reads, with one line a column naming the new name.
  const oldHeader = (text: string): string => text.replace('la_band_pct', 'sweet_spot_pct').replace('run_speed_ft_s', 'sprint_ft_s');
  it('reads sweet_spot_pct as la_band_pct and sprint_ft_s as run_speed_ft_s, one notice each naming the new name', async () => {
    const roster = await readRoster(rosterDir({ 'batting.csv': oldHeader(csv('batting', [{ la_band_pct: '31', run_speed_ft_s: '28.5' }])) }));
    expect(roster.batting[0]?.laBandPct).toBe(31);
    expect(roster.batting[0]?.runSpeedFtS).toBe(28.5);
    expect(roster.ignoredColumns['batting.csv']).toBeUndefined();
    expect(roster.notices.filter((n) => n.includes('its new name'))).toEqual([
      'batting.csv: column sweet_spot_pct read as la_band_pct, its new name (rename the column to la_band_pct)',
      'batting.csv: column sprint_ft_s read as run_speed_ft_s, its new name (rename the column to run_speed_ft_s)',
    ]);
  });
  it('reads the current name and says nothing when a file has it', async () => {
    const roster = await readRoster(rosterDir({ 'batting.csv': csv('batting', [{}]) }));
    expect(roster.notices.some((n) => n.includes('its new name'))).toBe(false);
  });
});
