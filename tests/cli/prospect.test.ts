import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { runCli } from '../helpers/runCli.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { openStore } from '../../src/store/openStore.ts';
import { writeStore } from '../../src/store/writeStore.ts';
import { buildSimStore, type SimStore } from '../outlook/simStore.ts';
import { prospectResultSchema } from '../outlook/outlookContract.ts';

let sim: SimStore;
let store: string;
/** A High-level infielder and a High-level starter of the last season, each with a season before it. */
let hitter = '';
let pitcher = '';
let lastSeason = 0;

beforeAll(async () => {
  sim = await buildSimStore();
  store = sim.storeDir;
  const s = await openProfileStore(store);
  const pick = (group: 'IF' | 'SP'): string => {
    const g = s.groups.get(group);
    const aa = s.levels.indexOf('High');
    lastSeason = Math.max(...(g?.season ?? [0]));
    for (let i = (g?.n ?? 0) - 1; g && i >= 0; i--) {
      if (g.level[i] === aa && g.season[i] === lastSeason && !Number.isNaN(g.age[i] as number)) {
        const p = g.player[i] as number;
        if (g.player.some((q, j) => q === p && g.season[j] === lastSeason - 1)) return s.players[p]?.playerId ?? '';
      }
    }
    throw new Error(`no High ${group} in the test league`);
  };
  hitter = pick('IF');
  pitcher = pick('SP');
});
afterAll(() => sim.remove());

const json = async (...args: string[]): Promise<ReturnType<typeof prospectResultSchema.parse>> => {
  const out = await runCli('prospect', ...args, '--store', store, '--format', 'json');
  expect(out.stderr).toBe('');
  expect(out.code).toBe(0);
  return prospectResultSchema.parse(JSON.parse(out.stdout));
};

describe('kindred prospect <player>', () => {
  it('prints comps, what became of them, and the outlook beside the base rate', async () => {
    const out = await runCli('prospect', hitter, '--store', store);
    expect(out.code).toBe(0);
    expect(out.stdout).toMatch(/^Prospect comps for .*\(p\d+\), \d{4} High /);
    expect(out.stdout).toMatch(/What the \d+ comps did in the 6 seasons after theirs/);
    expect(out.stdout).toMatch(/Reached the top level +\d+% +\d+%/);
    expect(out.stdout).toMatch(/Peak OPS\+/);
    expect(out.stdout).toMatch(/not what this one will do/);
  });

  it('calls the top level by the roster\'s own word, never by a real league\'s name, in table, CSV and JSON', async () => {
    // Project rule: the top level is the roster's highest declared level (here the demo league's "Top").
    const table = await runCli('prospect', hitter, '--store', store);
    const csv = await runCli('prospect', hitter, '--store', store, '--format', 'csv');
    const r = await json(pitcher);
    // the level the table names is one the roster declared (levels.csv), and its columns speak of the top level
    const level = table.stdout.match(/^Prospect comps for .*\(p\d+\), \d{4} (\S+) /)?.[1];
    expect(['Entry', 'Low', 'Mid', 'High', 'Elite', 'Top']).toContain(level);
    for (const text of [csv.stdout, JSON.stringify(r)]) expect(text).toContain('top_level');
    expect(table.stdout).toMatch(/First top +Top yrs/);
    expect(csv.stdout.split('\n')[0]).toContain('reached_top_level,first_top_level_season,top_level_seasons');
    expect(r.outlook).toHaveProperty('reached_top_level');
    expect(r.comps[0]?.outcome).toHaveProperty('first_top_level_season');
  });

  it('shows each comp\u2019s playing time and coverage in the table, as in the JSON', async () => {
    const out = await runCli('prospect', hitter, '--store', store);
    const r = await json(hitter);
    const head = out.stdout.split('\n').find((l) => l.trimStart().startsWith('# ')) ?? '';
    expect(head).toMatch(/ Age +PA +Like +Cov /);
    const first = r.comps[0];
    if (!first) throw new Error('no comps');
    // the id is on the line under the comp's row
    const lines = out.stdout.split('\n');
    const at = lines.findIndex((l) => l.trim().startsWith(first.player_id));
    const row = `${lines[at - 1] ?? ''} ${lines[at] ?? ''} `;
    expect(row).toContain(` ${first.sample} `);
    expect(row).toContain(` ${Math.round(first.coverage * 100)}% `);
  });

  it('--format json holds to the contract, echoes player_id and season, and gives hitters peak OPS+', async () => {
    const r = await json(hitter);
    expect(r.query.player_id).toBe(hitter);
    expect(r.query.season).toBe(lastSeason);
    expect(r.query.k).toBe(25);
    expect(r.query.horizon_seasons).toBe(6);
    expect(r.outlook.peak_ops_plus).toBeDefined();
    expect(r.outlook.peak_fip_minus).toBeUndefined();
    expect(r.outlook.comps_used).toBe(r.comps.length);
    for (const c of r.comps) {
      expect(c.outcome.window).toEqual([c.season + 1, c.season + 6]);
      expect(c.outcome.censored).toBe(false);
    }
  });

  it('gives pitchers the best FIP- instead', async () => {
    const r = await json(pitcher);
    expect(r.outlook.peak_fip_minus).toBeDefined();
    expect(r.outlook.peak_ops_plus).toBeUndefined();
    expect(r.comps.every((c) => c.outcome.kind === 'pitcher')).toBe(true);
  });

  it('--horizon, --k, --path and --include-censored change the query and are echoed', async () => {
    const r = await json(hitter, '--horizon', '3', '--k', '6', '--path', '2', '--include-censored');
    expect(r.query).toMatchObject({ horizon_seasons: 3, k: 6, path_seasons: 2, include_censored: true });
    expect(r.query.path).toHaveLength(2);
    expect(r.outlook.comps_used).toBeLessThanOrEqual(6);
    expect(r.comps.filter((c) => c.censored)).toHaveLength(r.outlook.comps_censored);
    for (const c of r.comps) expect(c.path).toHaveLength(2);
    expect(r.pool.rules.complete_window_to).toBe(lastSeason - 3);
  });

  it('--format csv gives one row per comp with its outcome', async () => {
    const out = await runCli('prospect', hitter, '--store', store, '--format', 'csv', '--k', '5');
    expect(out.code).toBe(0);
    const rows: string[][] = parse(out.stdout);
    expect(rows[0]).toContain('peak_ops_plus');
    expect(rows[0]).toContain('reached_top_level');
    expect(rows).toHaveLength(6);
    expect(rows.slice(1).every((r) => r[0] === hitter && (r[rows[0]?.indexOf('censored') ?? -1] === 'false'))).toBe(true);
  });

  it('--batch writes one JSON line per target and an error line for a bad one (exit 1)', async () => {
    const file = join(sim.dir, 'targets.csv');
    await writeFile(file, `player_id,season,level\n${hitter},${lastSeason},High\nnobody,,\n${pitcher},,\n`);
    const out = await runCli('prospect', '--batch', file, '--store', store, '--k', '3');
    expect(out.code).toBe(1);
    const lines = out.stdout.trim().split('\n').map((l) => JSON.parse(l) as { query: { player_id: string }; error?: { code: string } });
    expect(lines.map((l) => l.query.player_id)).toEqual([hitter, 'nobody', pitcher]);
    expect(lines[1]?.error?.code).toBe('kindred.query.unknownPlayer');
    expect(prospectResultSchema.safeParse(lines[0]).success).toBe(true);
    expect(out.stderr).toMatch(/1 of 3 targets failed/);
  });

  it('exits 2 on bad usage and 1 on a query that cannot be answered', async () => {
    expect((await runCli('prospect', hitter, '--store', store, '--horizon', '0')).code).toBe(2);
    expect((await runCli('prospect', hitter, '--store', store, '--path', 'two')).code).toBe(2);
    expect((await runCli('prospect', '--store', store)).code).toBe(2);
    expect((await runCli('prospect', hitter, '--store', store, '--want', 'obp=.300')).code).toBe(2);
    const unknown = await runCli('prospect', 'Nobody Atall', '--store', store);
    expect(unknown.code).toBe(1);
    expect(unknown.stderr).toMatch(/kindred\.query\.unknownPlayer/);
    const tooLong = await runCli('prospect', hitter, '--store', store, '--path', '30');
    expect(tooLong.code).toBe(1);
    expect(tooLong.stderr).toMatch(/a path of 30 seasons needs 30 consecutive profiled seasons/);
  });

  it('exits 1 and asks for a rebuild on a store built without outcomes', async () => {
    const opened = await openStore(store);
    const files = new Map<string, Uint8Array>();
    for (const name of Object.keys(opened.manifest.files)) if (name !== 'outcomes.json') files.set(name, await opened.readBytes(name));
    const old = join(sim.dir, 'old-store');
    await writeStore(old, { params: opened.manifest.params, files });
    const out = await runCli('prospect', hitter, '--store', old);
    expect(out.code).toBe(1);
    expect(out.stderr).toMatch(/no outcomes\.json .*rebuild it with kindred build \[kindred\.store\.missing\]/);
  });
});
