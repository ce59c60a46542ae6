
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.ts';
import { compsResultSchema } from './compsContract.ts';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { scratchDir } from '../helpers/scratchDir.ts';

let single: string;
let windowed: string;
/** A hitter with at least four top-level seasons, and his third one. */
/** An infielder at his third top-level season, and the first top-level season his window of 5 holds. */
let hitter: { id: string; season: number; first: number };
/** The roster's top level. */
let top: string;

beforeAll(async () => {
  const dir = await scratchDir('kindred-window-cli-');
  const league = simulateLeague({ seed: 77, firstSeason: 2010, lastSeason: 2026, targetPlayerSeasons: 3000 });
  await writeLeagueCsv(league, join(dir, 'roster'));
  single = join(dir, 'single');
  windowed = join(dir, 'windowed');
  expect((await runCli('build', join(dir, 'roster'), '--store', single, '--no-backtest', '--windows', '1')).code).toBe(0);
  // the build's default windows: single seasons and 5 seasons
  const built = await runCli('build', join(dir, 'roster'), '--store', windowed, '--no-backtest');
  expect(built.code).toBe(0);
  expect(built.stderr).toMatch(/Profiles over 5 seasons: C \d/);
  const store = await openProfileStore(single);
  const g = store.groups.get('IF');
  if (!g) throw new Error('no infielders');
  top = store.levels[store.levels.length - 1] ?? '';
  const topIdx = store.levels.indexOf(top);
  const seasons = new Map<number, number[]>();
  for (let r = 0; r < g.n; r++) if (g.level[r] === topIdx) seasons.set(g.player[r] as number, [...(seasons.get(g.player[r] as number) ?? []), g.season[r] as number]);
  const [player, list] = [...seasons].find(([, s]) => s.length >= 4) ?? [-1, []];
  const sorted = [...list].sort((a, b) => a - b);
  hitter = { id: store.players[player]?.playerId ?? '', season: sorted[2] ?? 0, first: sorted.slice(0, 3).find((x) => x > (sorted[2] ?? 0) - 5) ?? 0 };
});

describe('kindred comps --window', () => {
  it('--window 1 answers byte for byte as a store built without windows (where no --window means 1), in every format', async () => {
    for (const format of ['table', 'json', 'csv']) {
      const before = await runCli('comps', hitter.id, '--store', single, '--season', String(hitter.season), '--level', top, '--format', format);
      expect(before.code).toBe(0);
      const now = await runCli('comps', hitter.id, '--store', windowed, '--season', String(hitter.season), '--level', top, '--format', format, '--window', '1');
      expect(now.stdout).toBe(before.stdout);
    }
  });

  it('defaults comps to windows of 5 seasons in a store that has them; cheaper keeps single seasons', async () => {
    const at = ['--season', String(hitter.season), '--level', top, '--format', 'json'];
    const plain = await runCli('comps', hitter.id, '--store', windowed, ...at);
    const five = await runCli('comps', hitter.id, '--store', windowed, ...at, '--window', '5');
    expect(plain.code).toBe(0);
    expect(plain.stdout).toBe(five.stdout);
    expect(compsResultSchema.parse(JSON.parse(plain.stdout)).query.window).toBe(5);
    const cheaper = await runCli('cheaper', hitter.id, '--store', windowed, ...at, '--max-share', '1');
    expect(cheaper.code).toBe(0);
    expect(cheaper.stdout).not.toMatch(/"window": 5/);
  });

  it('--window 5 compares his window ending at the asked season with windows ending at any season, each with the seasons it spans (JSON)', async () => {
    const out = await runCli('comps', hitter.id, '--store', windowed, '--season', String(hitter.season), '--level', top, '--format', 'json', '--window', '5', '--k', '15');
    expect(out.code).toBe(0);
    const r = compsResultSchema.parse(JSON.parse(out.stdout));
    expect(r.query.window).toBe(5);
    expect(r.query.seasons?.[1]).toBe(hitter.season);
    // his third top-level season: the window reaches back to his first top-level season, and never a season after it
    expect(r.query.seasons?.[0]).toBe(hitter.first);
    expect(r.comps.length).toBeGreaterThanOrEqual(3);
    for (const c of r.comps) {
      const [first, last] = c.seasons ?? [NaN, NaN];
      expect(last).toBe(c.season);
      expect(first).toBeLessThanOrEqual(c.season);
      expect(c.season - first).toBeLessThanOrEqual(4);
    }
    expect(new Set(r.comps.map((c) => c.season)).size).toBeGreaterThan(1);
  });

  it('shows each comp\u2019s window in the table (e.g. 2019-21) and in the CSV (first_season beside season)', async () => {
    const table = await runCli('comps', hitter.id, '--store', windowed, '--season', String(hitter.season), '--level', top, '--window', '5');
    expect(table.stdout).toMatch(/windows of 5 seasons/);
    expect(table.stdout).toMatch(/ \d{4}-\d{2} +Top /);
    const csv = await runCli('comps', hitter.id, '--store', windowed, '--season', String(hitter.season), '--level', top, '--window', '5', '--format', 'csv');
    const [head, first] = csv.stdout.split('\n');
    const cols = (head ?? '').split(',');
    expect(cols.slice(0, 4)).toEqual(['target_player_id', 'target_first_season', 'target_season', 'target_level']);
    const cells = (first ?? '').split(',');
    expect(Number(cells[cols.indexOf('first_season')])).toBeLessThanOrEqual(Number(cells[cols.indexOf('season')]));
    expect(Number(cells[1])).toBe(hitter.first);
  });

  it('refuses a window the store was not built with, naming the windows it has (kindred.query.noWindow)', async () => {
    const out = await runCli('comps', hitter.id, '--store', windowed, '--window', '2', '--format', 'json');
    expect(out.code).toBe(1);
    expect(out.stderr).toMatch(/no profiles over 2 seasons \(it has windows of 1, 5\)/);
    // the rebuild it suggests is one shell word, sizes in order, as kindred build --windows parses it
    expect(out.stderr).toMatch(/rebuild it with kindred build --windows 1,2,5(\s|$)/);
    const suggested = /--windows (\S+)/.exec(out.stderr)?.[1] ?? '';
    const rebuilt = await runCli('build', join(windowed, '..', 'roster'), '--store', join(windowed, '..', 'suggested'), '--no-backtest', '--windows', suggested);
    expect(rebuilt.code).toBe(0);
    const bad = await runCli('comps', hitter.id, '--store', windowed, '--window', '9');
    expect(bad.code).toBe(2);
  });

  it('serves the other jobs over windows too: match and cheaper name the window', async () => {
    const cheaper = await runCli('cheaper', hitter.id, '--store', windowed, '--season', String(hitter.season), '--level', top, '--window', '5', '--format', 'json', '--max-share', '1');
    expect(cheaper.code).toBe(0);
    expect(cheaper.stdout).toMatch(/"window": 5/);
  });
});
