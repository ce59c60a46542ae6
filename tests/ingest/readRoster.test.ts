import { rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { formatIssue, InputError } from '../../src/errors/InputError.ts';
import { ISSUE_CAP, REJECTED_CELL_CHARS, REJECTED_CELLS_KEPT } from '../../src/ingest/IssueLog.ts';
import { loadColumnMap } from '../../src/ingest/loadColumnMap.ts';
import { readRoster } from '../../src/ingest/readRoster.ts';
import { col, csv, expectOneIssue, PLAYER_ROWS, removeRosterDirs, rosterDir, strictIssues } from './rosterFixture.ts';

afterAll(removeRosterDirs);

describe('readRoster(dir) strict (the default)', () => {
  it('throws one InputError carrying every issue of every file, the first in its message', async () => {
    const dir = rosterDir({
      'players.csv': csv('players', [...PLAYER_ROWS, { player_id: 'p4', bats: 'X' }]),
      'batting.csv': csv('batting', [{ H: 'abc' }, { player_id: 'p2', BB: '-1', SO: '1.5' }]),
      'fielding.csv': csv('fielding', [{ inn: '6.3' }]),
    });
    const err = await readRoster(dir).then(() => undefined, (e: unknown) => e);
    expect(err).toBeInstanceOf(InputError);
    if (!(err instanceof InputError)) return;
    expect(err.code).toBe('kindred.input.badValue');
    expect(err.issues.map((i) => [i.file, i.line, i.code])).toEqual([
      ['players.csv', 5, 'kindred.input.badValue'],
      ['batting.csv', 2, 'kindred.input.notNumeric'],
      ['batting.csv', 3, 'kindred.input.negative'],
      ['batting.csv', 3, 'kindred.input.notInteger'],
      ['fielding.csv', 2, 'kindred.input.badThirds'],
    ]);
    const first = err.issues[0];
    expect(first).toBeDefined();
    if (first !== undefined) expect(err.message).toContain(formatIssue(first));
    expect(err.message).toContain('4 more problems');
  });
  it(`keeps the first ${ISSUE_CAP} issues and says how many there were in all`, async () => {
    const rows = Array.from({ length: 250 }, (_, i) => ({ team: `T${i}`, level: 'AA', SO: 'x' }));
    const { issues, message } = await strictIssues(rosterDir({ 'batting.csv': csv('batting', rows) }));
    expect(issues).toHaveLength(ISSUE_CAP);
    expect(issues[ISSUE_CAP - 1]?.line).toBe(ISSUE_CAP + 1);
    expect(message).toContain('250 problems');
    expect(message).toContain('50 more not listed');
  });
  it('returns nothing and throws even when only one cell is bad', async () => {
    const { issues } = await strictIssues(rosterDir({ 'batting.csv': csv('batting', [{}, { player_id: 'p2' }, { player_id: 'p3', AB: '1x' }]) }));
    expect(issues).toHaveLength(1);
  });
});

describe('readRoster(dir, { lenient: true })', () => {
  it('returns the good rows and lists each bad row with all its reasons', async () => {
    const dir = rosterDir({
      'batting.csv': csv('batting', [{}, { player_id: 'p2', H: '200', BB: '-3' }, { player_id: 'p3' }]),
    });
    const roster = await readRoster(dir, { lenient: true });
    expect(roster.batting.map((b) => b.playerId)).toEqual(['p1', 'p3']);
    expect(roster.rowsRead['batting.csv']).toBe(3);
    expect(roster.rejected).toHaveLength(1);
    const rejected = roster.rejected[0];
    expect(rejected?.file).toBe('batting.csv');
    expect(rejected?.line).toBe(3);
    expect(rejected?.raw[0]).toBe('p2');
    expect(rejected?.issues.map((i) => [i.code, i.column, i.value])).toEqual([
      ['kindred.input.negative', col('batting', 'BB'), '-3'],
      ['kindred.input.inconsistent', col('batting', 'H'), '200'],
    ]);
  });
  it("rejects a player's rows elsewhere when his players.csv row is rejected (unknown player_id)", async () => {
    const dir = rosterDir({
      'players.csv': csv('players', [{}, { player_id: 'p2', bats: 'X' }, PLAYER_ROWS[2] ?? {}]),
      'batting.csv': csv('batting', [{}, { player_id: 'p2' }]),
      'pitching.csv': csv('pitching', [{ player_id: 'p2' }]),
    });
    const roster = await readRoster(dir, { lenient: true });
    expect([...roster.players.keys()]).toEqual(['p1', 'p3']);
    expect(roster.batting.map((b) => b.playerId)).toEqual(['p1']);
    expect(roster.pitching).toEqual([]);
    expect(roster.rejected.map((r) => [r.file, r.line, r.issues.map((i) => i.code).join()])).toEqual([
      ['players.csv', 3, 'kindred.input.badValue'],
      ['batting.csv', 3, 'kindred.input.unknownPlayer'],
      ['pitching.csv', 2, 'kindred.input.unknownPlayer'],
    ]);
    expect(roster.rejected[1]?.issues[0]?.expected).toContain('line 3, was rejected');
  });
  it('still throws for problems of a whole file (a missing column)', async () => {
    const dir = rosterDir({ 'batting.csv': csv('batting', [{}], ['AB']) });
    await expect(readRoster(dir, { lenient: true })).rejects.toMatchObject({ code: 'kindred.input.missingColumn' });
  });
});

describe('readRoster: combining stints', () => {
  it('sums counts and weights the batted-ball averages by bbe and run speed by PA (worked by hand)', async () => {
    const dir = rosterDir({
      'batting.csv': csv('batting', [
        {},
        { team: 'T2', G: '15', PA: '60', AB: '52', H: '14', '2B': '3', '3B': '0', HR: '2', BB: '5', IBB: '0', HBP: '1', SF: '2', SO: '12', SB: '1', CS: '0', bbe: '40', ev_avg_mph: '85.5', ev_p90_mph: '100.0', la_avg_deg: '10.0', hard_hit_pct: '30', la_band_pct: '27', run_speed_ft_s: '28.0' },
        { team: 'T3', G: '5', PA: '20', AB: '18', H: '4', '2B': '1', '3B': '0', HR: '0', BB: '2', IBB: '0', HBP: '0', SF: '0', SO: '5', SB: '0', CS: '0', bbe: '12', ev_avg_mph: '', ev_p90_mph: '', la_avg_deg: '', hard_hit_pct: '', la_band_pct: '', run_speed_ft_s: '' },
        { player_id: 'p2' },
      ]),
    });
    const roster = await readRoster(dir);
    expect(roster.batting).toHaveLength(2);
    const b = roster.batting[0];
    expect(b).toMatchObject({
      playerId: 'p1', season: 2021, level: 'AA', teams: ['T1', 'T2', 'T3'], G: 50,
      PA: 200, AB: 175, H: 48, doubles: 10, triples: 1, HR: 6, BB: 17, IBB: 1, HBP: 3, SF: 5, SO: 42, SB: 4, CS: 1, bbe: 132,
    });
    // By hand: only the stints with a value count. ev_avg = (88.5*80 + 85.5*40) / 120 = 10500 / 120 = 87.5
    expect(b?.evAvgMph).toBeCloseTo(87.5, 10);
    // ev_p90 = (102*80 + 100*40) / 120 = 12160 / 120
    expect(b?.evP90Mph).toBeCloseTo(12160 / 120, 10);
    // hard_hit = (38*80 + 30*40) / 120 = 4240 / 120
    expect(b?.hardHitPct).toBeCloseTo(4240 / 120, 10);
    // sprint by PA = (27.1*120 + 28.0*60) / 180 = 4932 / 180 = 27.4
    expect(b?.runSpeedFtS).toBeCloseTo(27.4, 10);
  });
  it('weights arm by innings and pop time by sb_against, falling back to innings when a stint lacks sb_against', async () => {
    const stint2 = { team: 'T2', G: '12', inn: '100.2', PO: '90', A: '7', E: '1', arm_mph: '83', pop_2b_s: '2.05', exchange_s: '0.80', sb_against: '20', cs_caught: '4' };
    const roster = await readRoster(rosterDir({ 'fielding.csv': csv('fielding', [{}, stint2]) }));
    const f = roster.fielding[0];
    expect(f).toMatchObject({ pos: 'C', teams: ['T1', 'T2'], G: 37, outs: 601 + 302, PO: 270, A: 22, E: 3, sbAgainst: 60, csCaught: 14 });
    // arm = (80*601 + 83*302) / 903 = 73146 / 903; pop = (1.95*40 + 2.05*20) / 60 = 119 / 60
    expect(f?.armMph).toBeCloseTo(73146 / 903, 10);
    expect(f?.pop2bS).toBeCloseTo(119 / 60, 10);
    expect(f?.exchangeS).toBeCloseTo((0.72 * 40 + 0.8 * 20) / 60, 10);

    const noSb = await readRoster(rosterDir({ 'fielding.csv': csv('fielding', [{}, { ...stint2, sb_against: '', cs_caught: '' }]) }));
    // pop by innings = (1.95*601 + 2.05*302) / 903 = 1791.05 / 903
    expect(noSb.fielding[0]?.pop2bS).toBeCloseTo(1791.05 / 903, 10);
    expect(noSb.fielding[0]?.sbAgainst).toBeUndefined();
  });
  it('weights fastball velocity by BF and ground-ball rate by balls in play (BF - SO - BB - HBP)', async () => {
    const stint2 = { team: 'T2', G: '10', GS: '0', IP: '20.1', BF: '90', H: '20', HR: '2', BB: '10', HBP: '1', SO: '25', ER: '9', fb_mph: '95.0', fb_spin_rpm: '2400', whiff_pct: '30', gb_pct: '40' };
    const roster = await readRoster(rosterDir({ 'pitching.csv': csv('pitching', [{}, stint2]) }));
    const p = roster.pitching[0];
    expect(p).toMatchObject({ playerId: 'p3', teams: ['T1', 'T2'], G: 30, GS: 10, outs: 242 + 61, BF: 430, H: 90, HR: 10, BB: 40, HBP: 5, SO: 115, ER: 44 });
    // fb = (93.5*340 + 95*90) / 430 = 40340 / 430; gb = (45*216 + 40*54) / 270 = 11880 / 270 = 44
    expect(p?.fbMph).toBeCloseTo(40340 / 430, 10);
    expect(p?.gbPct).toBeCloseTo(44, 10);
    expect(p?.whiffPct).toBeCloseTo((25 * 340 + 30 * 90) / 430, 10);
  });
  it('reads contracts.csv', async () => {
    const roster = await readRoster(rosterDir({ 'contracts.csv': csv('contracts', [{}, { player_id: 'p2', salary_usd: '1250000.50' }]) }));
    expect(roster.contracts).toEqual([
      { playerId: 'p1', season: 2021, salaryUsd: 750000 },
      { playerId: 'p2', season: 2021, salaryUsd: 1250000.5 },
    ]);
  });
});

describe('readRoster: levels', () => {
  it('uses the order of levels.csv and refuses a level outside it, naming the known ones', async () => {
    const dir = rosterDir({ 'levels.csv': 'level\nLow\nHigh\n', 'batting.csv': csv('batting', [{ level: 'High' }]) });
    const roster = await readRoster(dir);
    expect(roster.levels).toEqual(['Low', 'High']);
    expect(roster.batting[0]?.level).toBe('High');
    const bad = rosterDir({ 'levels.csv': 'level\nLow\nHigh\n', 'batting.csv': csv('batting', [{ level: 'AA' }]) });
    const { issues } = await strictIssues(bad);
    const issue = expectOneIssue(issues, { code: 'kindred.input.badValue', file: 'batting.csv', line: 2, column: col('batting', 'level'), value: 'AA' });
    expect(issue.expected).toContain('Low, High');
    expect(issue.expected).toContain('levels.csv');
  });
  it('has no built-in order: a roster without levels.csv is refused once, asking for the file (and no level is refused for it)', async () => {
    const dir = rosterDir({ 'batting.csv': csv('batting', [{ level: 'AA' }, { player_id: 'p2', level: 'Mid' }]) }, ['levels.csv']);
    const { issues } = await strictIssues(dir);
    expect(issues.map((i) => i.code)).toEqual(['kindred.input.missingFile']);
    const issue = issues[0];
    if (!issue) throw new Error('no issue');
    expect(issue).toMatchObject({ file: 'levels.csv' });
    expect(formatIssue(issue)).toContain('lowest first');
  });
});

describe('readRoster with a column map', () => {
  it("reads the club's file and column names as the canonical ones", async () => {
    const text = csv('batting', [{}]).replace('player_id,', 'pid,').replace(',PA,', ',plate_app,');
    const dir = rosterDir({ 'their_batting.csv': text, 'players.csv': csv('players', PLAYER_ROWS).replace(',name,', ',full_name,') });
    const { rmSync } = await import('node:fs');
    rmSync(join(dir, 'batting.csv'));
    const mapPath = join(dir, 'map.json');
    writeFileSync(mapPath, JSON.stringify({
      files: { 'batting.csv': 'their_batting.csv' },
      columns: { 'batting.csv': { player_id: 'pid', PA: 'plate_app' }, 'players.csv': { name: 'full_name' } },
    }));
    const roster = await readRoster(dir, { columnMap: await loadColumnMap(mapPath) });
    expect(roster.batting[0]).toMatchObject({ playerId: 'p1', PA: 120 });
    expect(roster.players.get('p2')?.name).toBe('Bo Sample');
    expect(roster.rowsRead['batting.csv']).toBe(1);
  });
  it('refuses a map that names a file the roster folder lacks, at the key and its line (not ignored)', async () => {
    const dir = rosterDir();
    const mapPath = join(dir, 'map.json');
    writeFileSync(mapPath, '{\n  "files": {\n    "fielding.csv": "their_fielding.csv"\n  }\n}\n');
    const { issues } = await strictIssues(dir, { columnMap: await loadColumnMap(mapPath) });
    const issue = issues.find((i) => i.code === 'kindred.input.badColumnMap');
    expect(issue).toMatchObject({ file: mapPath, line: 3, column: 5, field: 'files.fielding.csv', value: 'their_fielding.csv' });
    expect(issue?.expected).toContain('not in');
  });
  it("reports a mapped column that is absent under the club's name and the canonical name", async () => {
    const dir = rosterDir({ 'their_batting.csv': csv('batting', [{}]) });
    const mapPath = join(dir, 'map.json');
    writeFileSync(mapPath, JSON.stringify({ files: { 'batting.csv': 'their_batting.csv' }, columns: { 'batting.csv': { SO: 'strikeouts' } } }));
    const { issues } = await strictIssues(dir, { columnMap: await loadColumnMap(mapPath) });
    const issue = expectOneIssue(issues, { code: 'kindred.input.missingColumn', file: 'their_batting.csv', line: 1, column: 0, value: 'strikeouts', field: 'SO' });
    expect(formatIssue(issue)).toContain('SO');
    expect(issue.expected).toContain('"strikeouts"');
  });
});

describe('readRoster: what a roster leaves out', () => {
  it('names --columns when players.csv is missing', async () => {
    const dir = rosterDir();
    rmSync(join(dir, 'players.csv'));
    const { issues } = await strictIssues(dir);
    const issue = expectOneIssue(issues, { code: 'kindred.input.missingFile', file: 'players.csv', line: 0, column: 0, value: join(dir, 'players.csv') });
    expect(issue.expected).toContain('--columns');
    expect(formatIssue(issue)).toMatch(/^players\.csv: /);
  });
  it('says so when the files leave groups empty: batting only makes every hitter a DH, and there are no pitchers', async () => {
    const roster = await readRoster(rosterDir());
    expect(roster.notices).toEqual([
      'no fielding.csv: every hitter is profiled as DH (no C, IF or OF profiles)',
      'no pitching.csv: no pitcher profiles (SP, RP)',
    ]);
    const full = await readRoster(rosterDir({ 'fielding.csv': csv('fielding', [{}]), 'pitching.csv': csv('pitching', [{}]) }));
    expect(full.notices).toEqual([]);
  });
  it('refuses a lenient read that rejects every batting and pitching row (no store without profiles), listing the reasons', async () => {
    const dir = rosterDir({ 'batting.csv': csv('batting', [{ H: 'x' }, { player_id: 'p2', AB: '-1' }]) });
    const err = await readRoster(dir, { lenient: true }).then(() => undefined, (e: unknown) => e);
    if (!(err instanceof InputError)) throw new Error('expected an InputError');
    expect(err.code).toBe('kindred.input.nothingLeft');
    expect(err.message).toContain('every row of batting.csv and pitching.csv was rejected (2 rows in all)');
    expect(err.issues.slice(1).map((i) => [i.line, i.code])).toEqual([[2, 'kindred.input.notNumeric'], [3, 'kindred.input.negative']]);
  });
  it('keeps only the first cells of a rejected ragged row under --lenient (bounded memory)', async () => {
    const wide = Array.from({ length: 5000 }, (_, i) => String(i)).join(',');
    const long = 'x'.repeat(10_000);
    const dir = rosterDir({ 'batting.csv': `${csv('batting', [{}])}${wide}\n${long}\n` });
    const roster = await readRoster(dir, { lenient: true });
    expect(roster.rejected.map((r) => [r.line, r.rawCells, r.raw.length])).toEqual([[3, 5000, REJECTED_CELLS_KEPT], [4, 1, 1]]);
    expect(roster.rejected[1]?.raw[0]).toHaveLength(REJECTED_CELL_CHARS);
  });
});

describe('readRoster(dir) memory', () => {
  it('gives the records of one team one shared team list (a roster holds millions of records), and a split season its own list of both teams', async () => {
    const dir = rosterDir({
      'batting.csv': csv('batting', [
        { player_id: 'p1', team: 'T1' },
        { player_id: 'p2', team: 'T1' },
        { player_id: 'p3', team: 'T1' },
        { player_id: 'p3', team: 'T2' },
      ]),
    });
    const roster = await readRoster(dir);
    const of = (id: string) => roster.batting.find((b) => b.playerId === id);
    expect(of('p1')?.teams).toEqual(['T1']);
    expect(of('p2')?.teams, 'the same list object').toBe(of('p1')?.teams);
    expect(of('p3')?.teams).toEqual(['T1', 'T2']);
    expect(of('p1')?.teams, 'combining stints leaves the shared list as it was').toEqual(['T1']);
  });
});
