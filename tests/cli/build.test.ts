import { cp, readFile, readdir, stat, writeFile } from 'node:fs/promises';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.ts';
import { DEMO_ROSTER } from '../../src/cli/commands/demoCommand.ts';
import { scratchDir } from '../helpers/scratchDir.ts';

let dir: string;
let roster: string;

/** Replaces one cell of a data row in a CSV file (line is 1-based, the header is line 1). */
async function setCell(file: string, line: number, column: string, value: string): Promise<void> {
  const lines = (await readFile(file, 'utf8')).split('\n');
  const header = (lines[0] ?? '').split(',');
  const cells = (lines[line - 1] ?? '').split(',');
  cells[header.indexOf(column)] = value;
  lines[line - 1] = cells.join(',');
  await writeFile(file, lines.join('\n'));
}

beforeAll(async () => {
  dir = await scratchDir('kindred-build-');
  roster = join(dir, 'roster');
  await cp(DEMO_ROSTER, roster, { recursive: true });
});

describe('kindred build with bad input', () => {
  it('stops with exit 1, reports file:line:column, the value and what was expected, and writes nothing', async () => {
    const bad = join(dir, 'bad');
    await cp(roster, bad, { recursive: true });
    await setCell(join(bad, 'batting.csv'), 5, 'H', '999');
    await setCell(join(bad, 'pitching.csv'), 3, 'IP', '6.3');
    const out = await runCli('build', bad, '--store', join(dir, 'never'), '--no-backtest');
    expect(out.code).toBe(1);
    expect(out.stderr).toMatch(/batting\.csv:5:\d+: .*"999".*expected/);
    expect(out.stderr).toMatch(/pitching\.csv:3:\d+: IP "6\.3": expected/);
    expect(existsSync(join(dir, 'never'))).toBe(false);
    expect((await readdir(dir)).filter((f) => f.includes('.tmp'))).toEqual([]);
  });

  it('leaves an existing store untouched when a rebuild fails', async () => {
    const storeDir = join(dir, 'kept');
    const built = await runCli('build', roster, '--store', storeDir);
    expect(built.code).toBe(0);
    // the build also replays the prospect outlook and stores it (backtest.json)
    expect(built.stderr).toMatch(/Backtest \(cuts \d{4}/);
    expect((await stat(join(storeDir, 'backtest.json'))).isFile()).toBe(true);
    const before = await readFile(join(storeDir, 'manifest.json'), 'utf8');
    const bad = join(dir, 'bad2');
    await cp(roster, bad, { recursive: true });
    await setCell(join(bad, 'fielding.csv'), 4, 'PO', '-3');
    const out = await runCli('build', bad, '--store', storeDir, '--no-backtest');
    expect(out.code).toBe(1);
    expect(await readFile(join(storeDir, 'manifest.json'), 'utf8')).toBe(before);
    expect((await runCli('comps', '--want', 'obp=.350', '--position', 'SS', '--store', storeDir, '--k', '1')).code).toBe(0);
  }, 300_000);

  it('with --lenient builds from the good rows and writes every skipped row with its reason to a rejects file', async () => {
    const bad = join(dir, 'bad3');
    await cp(roster, bad, { recursive: true });
    await setCell(join(bad, 'batting.csv'), 7, 'SO', 'abc');
    const storeDir = join(dir, 'lenient');
    const out = await runCli('build', bad, '--store', storeDir, '--lenient', '--no-backtest');
    expect(out.code).toBe(0);
    expect(out.stderr).toMatch(/Rows rejected: 1 \(every one with its reason in (.*)\)/);
    const path = /reason in (.*)\)/.exec(out.stderr)?.[1] ?? '';
    const rejects = await readFile(path, 'utf8');
    expect(rejects).toMatch(/batting\.csv,7,/);
    expect(rejects).toContain('abc');
    expect((await stat(join(storeDir, 'manifest.json'))).isFile()).toBe(true);
  });
});

describe('kindred build on a roster that leaves groups empty', () => {
  it('says that a batting-only roster profiles every hitter as DH and has no pitchers', async () => {
    const only = join(dir, 'batting-only');
    await cp(roster, only, { recursive: true });
    for (const f of ['fielding.csv', 'pitching.csv']) await writeFile(join(only, f), (await readFile(join(roster, f), 'utf8')).split('\n')[0] + '\n');
    const out = await runCli('build', only, '--store', join(dir, 'only-store'));
    expect(out.code).toBe(0);
    expect(out.stderr).toContain('Note: fielding.csv has no usable rows: every hitter is profiled as DH (no C, IF or OF profiles)');
    expect(out.stderr).toContain('Note: pitching.csv has no usable rows: no pitcher profiles (SP, RP)');
  });
  it('refuses to write a store when --lenient rejects every row, and leaves no store', async () => {
    const bad = join(dir, 'all-bad');
    await cp(roster, bad, { recursive: true });
    await writeFile(join(bad, 'players.csv'), 'player_id,name\n');
    const storeDir = join(dir, 'no-store');
    const out = await runCli('build', bad, '--store', storeDir, '--lenient');
    expect(out.code).toBe(1);
    expect(out.stderr).toMatch(/batting\.csv: "\d+ rows rejected": expected at least one good row in batting\.csv or pitching\.csv \(--lenient left out every row; no store is written\) \[kindred\.input\.nothingLeft\]/);
    expect(existsSync(storeDir)).toBe(false);
  });
});

describe('kindred build --columns map.json', () => {
  it('reads a club export with its own file and column names', async () => {
    const club = join(dir, 'club');
    await cp(roster, club, { recursive: true });
    const text = await readFile(join(club, 'batting.csv'), 'utf8');
    const [head, ...rest] = text.split('\n');
    await writeFile(join(club, 'hitting_export.csv'), [head?.replace(/(^|,)PA(,|$)/, '$1plate_app$2'), ...rest].join('\n'));
    await writeFile(join(club, 'batting.csv'), '');
    const map = join(dir, 'map.json');
    await writeFile(map, JSON.stringify({ files: { 'batting.csv': 'hitting_export.csv' }, columns: { 'batting.csv': { PA: 'plate_app' } } }));
    const out = await runCli('build', club, '--store', join(dir, 'clubstore'), '--columns', map, '--no-backtest');
    expect(out.stderr).toMatch(/Rows rejected: 0/);
    expect(out.code).toBe(0);
  });
});

describe('a corrupted store', () => {
  it('is refused with a clear message and exit 1, in a separate process that does not crash', async () => {
    const storeDir = join(dir, 'corrupt');
    expect((await runCli('build', roster, '--store', storeDir, '--no-backtest')).code).toBe(0);
    // a single-season index (the query below asks for single seasons; windows have their own, group-<G>.w5.hnsw)
    const indexFile = (await readdir(storeDir)).find((f) => f.endsWith('.hnsw') && !/\.w\d+\./.test(f));
    if (!indexFile) throw new Error('the demo store has no index file');
    const group = /^group-([A-Z]+)\./.exec(indexFile)?.[1] ?? '';
    const position = { C: 'C', IF: 'SS', OF: 'CF', DH: 'DH', SP: 'SP', RP: 'RP' }[group] ?? 'SS';
    const file = join(storeDir, indexFile);
    const bytes = await readFile(file);
    bytes.fill(0xff, 200, bytes.length - 10);
    await writeFile(file, bytes);
    const child = spawnSync(process.execPath, [join(process.cwd(), 'bin/kindred.js'), 'comps', '--want', 'obp=.350', '--position', position, '--store', storeDir, '--window', '1'], {
      encoding: 'utf8',
    });
    expect(child.signal).toBeNull();
    expect(child.status).toBe(1);
    expect(child.stderr).toContain(indexFile);
    expect(child.stderr).toContain('kindred.store.corrupt');
  });
});
