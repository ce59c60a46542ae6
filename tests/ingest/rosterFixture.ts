/**
 * Builds small invented roster folders in a temp dir for the ingest tests.
 * Each file has a default row; a test lists rows as overrides of it.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect } from 'vitest';
import { formatIssue, InputError, type InputIssue } from '../../src/errors/InputError.ts';
import { readRoster, type ReadRosterOptions } from '../../src/ingest/readRoster.ts';

type Row = Readonly<Record<string, string>>;

export const DEFAULTS = {
  players: { player_id: 'p1', name: 'Ann Example', birth_date: '1998-04-12', bats: 'L', throws: 'R' },
  batting: {
    player_id: 'p1', season: '2021', level: 'AA', team: 'T1', G: '30', PA: '120', AB: '105', H: '30', '2B': '6',
    '3B': '1', HR: '4', BB: '10', IBB: '1', HBP: '2', SF: '3', SO: '25', SB: '3', CS: '1', bbe: '80',
    ev_avg_mph: '88.5', ev_p90_mph: '102.0', la_avg_deg: '12.5', hard_hit_pct: '38.0', la_band_pct: '33.0',
    run_speed_ft_s: '27.1',
  },
  fielding: {
    player_id: 'p1', season: '2021', level: 'AA', team: 'T1', pos: 'C', G: '25', inn: '200.1', PO: '180', A: '15',
    E: '2', arm_mph: '80', pop_2b_s: '1.95', exchange_s: '0.72', sb_against: '40', cs_caught: '10',
  },
  pitching: {
    player_id: 'p3', season: '2021', level: 'AA', team: 'T1', G: '20', GS: '10', IP: '80.2', BF: '340', H: '70',
    HR: '8', BB: '30', HBP: '4', SO: '90', ER: '35', fb_mph: '93.5', fb_spin_rpm: '2300', whiff_pct: '25.0',
    gb_pct: '45.0',
  },
  contracts: { player_id: 'p1', season: '2021', salary_usd: '750000' },
} as const;

export type Table = keyof typeof DEFAULTS;

/** The three players every fixture roster has unless players.csv is given. */
export const PLAYER_ROWS: readonly Row[] = [
  {},
  { player_id: 'p2', name: 'Bo Sample', birth_date: '1999-11-30', bats: 'R', throws: 'R' },
  { player_id: 'p3', name: 'Cy Placeholder', birth_date: '2000-01-01', bats: 'S', throws: 'L' },
];

/** A CSV text: the default row's columns as header, one line per override (omit: columns to leave out). */
export function csv(table: Table, rows: readonly Row[], omit: readonly string[] = []): string {
  const columns = Object.keys(DEFAULTS[table]).filter((c) => !omit.includes(c));
  const base: Row = DEFAULTS[table];
  const lines = rows.map((r) => columns.map((c) => r[c] ?? base[c] ?? '').join(','));
  return [columns.join(','), ...lines].join('\n') + '\n';
}

/** 1-based column of a canonical column in the fixture header of a table. */
export function col(table: Table, name: string, omit: readonly string[] = []): number {
  const columns = Object.keys(DEFAULTS[table]).filter((c) => !omit.includes(c));
  const i = columns.indexOf(name);
  if (i < 0) throw new Error(`no column ${name} in the ${table} fixture`);
  return i + 1;
}

const made: string[] = [];

/** The levels every fixture roster declares unless levels.csv is given (invented names for the top one). */
export const FIXTURE_LEVELS = ['Rk', 'A', 'A+', 'AA', 'AAA', 'Top'] as const;

/** Writes a roster folder; levels.csv, players.csv and batting.csv default to valid files (omit: files to leave out). */
export function rosterDir(files: Readonly<Record<string, string>> = {}, omit: readonly string[] = []): string {
  const dir = mkdtempSync(join(tmpdir(), 'kindred-ingest-'));
  made.push(dir);
  const all: Record<string, string> = {
    'levels.csv': ['level', ...FIXTURE_LEVELS].join('\n') + '\n',
    'players.csv': csv('players', PLAYER_ROWS),
    'batting.csv': csv('batting', [{}]),
    ...files,
  };
  for (const [name, text] of Object.entries(all)) if (!omit.includes(name)) writeFileSync(join(dir, name), text);
  return dir;
}

export function removeRosterDirs(): void {
  for (const dir of made.splice(0)) rmSync(dir, { recursive: true, force: true });
}

/** Reads strictly and returns the InputError's issues (fails the test when nothing is thrown). */
export async function strictIssues(dir: string, options: ReadRosterOptions = {}): Promise<{ issues: readonly InputIssue[]; message: string }> {
  try {
    await readRoster(dir, options);
  } catch (err) {
    if (err instanceof InputError) return { issues: err.issues, message: err.message };
    throw err;
  }
  throw new Error('expected readRoster to throw an InputError');
}

/**
 * Asserts that exactly one issue has the code and that it sits at file:line:column with the value,
 * and that its formatted message shows the location and the value.
 */
export function expectOneIssue(
  issues: readonly InputIssue[],
  want: { code: InputIssue['code']; file: string; line: number; column: number; value: string; field?: string },
): InputIssue {
  const found = issues.filter((i) => i.code === want.code);
  expect(found, JSON.stringify(issues)).toHaveLength(1);
  const issue = found[0];
  if (issue === undefined) throw new Error('unreachable');
  expect(issue).toMatchObject(want);
  const text = formatIssue(issue);
  expect(text).toContain(want.line > 0 ? `${want.file}:${want.line}:${want.column}:` : `${want.file}: `);
  expect(text).toContain(JSON.stringify(want.value));
  expect(text).toContain(want.code);
  return issue;
}
