import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.ts';
import { compsResultSchema } from './compsContract.ts';
import { DEMO_ROSTER } from '../../src/cli/commands/demoCommand.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import { scratchDir } from '../helpers/scratchDir.ts';

let dir: string;
let store: string;
let profiles: ProfileStore;
/** A demo catcher and a demo shortstop with several seasons. */
let catcher: { id: string; name: string };

beforeAll(async () => {
  dir = await scratchDir('kindred-cli-');
  store = join(dir, 'store');
  const built = await runCli('build', DEMO_ROSTER, '--store', store, '--no-backtest');
  expect(built.code).toBe(0);
  profiles = await openProfileStore(store);
  const c = profiles.groups.get('C');
  if (!c) throw new Error('demo roster has no catchers');
  const last = c.n - 1;
  const p = profiles.players[c.player[last] as number];
  catcher = { id: p?.playerId ?? '', name: p?.name ?? '' };
});

describe('kindred build <demo-roster>', () => {
  it('reports rows read, rows rejected and profiles per group on stderr', async () => {
    const out = await runCli('build', DEMO_ROSTER, '--store', join(dir, 'again'), '--no-backtest');
    expect(out.code).toBe(0);
    expect(out.stdout).toBe('');
    expect(out.stderr).toMatch(/Rows read: .*batting\.csv 10,305/);
    expect(out.stderr).toMatch(/Rows rejected: 0/);
    expect(out.stderr).toMatch(/Profiles: C \d/);
  });
});

describe('kindred comps <player> --format json', () => {
  it('follows the documented JSON contract, with shares summing to 1 and never the target himself', async () => {
    const out = await runCli('comps', catcher.id, '--store', store, '--format', 'json');
    expect(out.code).toBe(0);
    const result = compsResultSchema.parse(JSON.parse(out.stdout));
    expect(result.query.player_id).toBe(catcher.id);
    expect(result.comps).toHaveLength(10);
    for (const c of result.comps) {
      expect(c.player_id).not.toBe(catcher.id);
      const sum = c.dimensions.reduce((a, d) => a + d.share, 0);
      expect(sum).toBeCloseTo(1, 6);
      expect(c.alike.length).toBeGreaterThan(0);
    }
    expect(result.comps.map((c) => c.likeness)).toEqual([...result.comps.map((c) => c.likeness)].sort((a, b) => b - a));
  });

  it('takes a name instead of an id, and his latest season at his highest level by default', async () => {
    const out = await runCli('comps', catcher.name, '--store', store, '--format', 'json', '--k', '3');
    expect(out.code).toBe(0);
    const result = compsResultSchema.parse(JSON.parse(out.stdout));
    expect(result.query.player_id).toBe(catcher.id);
    expect(result.comps).toHaveLength(3);
    const c = profiles.groups.get('C');
    const seasons: number[] = [];
    for (let i = 0; c && i < c.n; i++) if (profiles.players[c.player[i] as number]?.playerId === catcher.id) seasons.push(c.season[i] as number);
    expect(result.query.season).toBe(Math.max(...seasons));
  });

  it('lists the candidates of an ambiguous name and exits 1', async () => {
    const first = catcher.name.slice(0, 2);
    const out = await runCli('comps', first, '--store', store);
    expect(out.code).toBe(1);
    expect(out.stderr).toMatch(/matches \d+ players; pass a player id/);
    // a short table, one candidate a line under the message: id, name, birth date
    expect(out.stderr.split('\n').filter((l) => /^ {2}p\d+ {2}\S/.test(l)).length).toBeGreaterThan(1);
    expect(out.stderr).toContain('kindred.query.ambiguousPlayer');
  });

  it('says so for an unknown player and exits 1', async () => {
    const out = await runCli('comps', 'Nobody Atall', '--store', store);
    expect(out.code).toBe(1);
    expect(out.stderr).toMatch(/no player matches "Nobody Atall"/);
  });

  it('refuses a season the player did not play, listing the ones he did', async () => {
    const out = await runCli('comps', catcher.id, '--store', store, '--season', '1990');
    expect(out.code).toBe(1);
    expect(out.stderr).toMatch(/no profile for 1990; his profiled seasons: \d{4} /);
  });

  it('prints a table that fits 100 columns', async () => {
    const out = await runCli('comps', catcher.id, '--store', store);
    expect(out.code).toBe(0);
    expect(out.stdout).toMatch(/^Comps for /);
    for (const line of out.stdout.split('\n')) expect(line.length).toBeLessThanOrEqual(100);
  });

  it('writes CSV with a header and one row per comp', async () => {
    const out = await runCli('comps', catcher.id, '--store', store, '--format', 'csv', '--k', '4');
    expect(out.code).toBe(0);
    const lines = out.stdout.trim().split('\n');
    expect(lines).toHaveLength(5);
    expect(lines[0]).toMatch(/^target_player_id,target_first_season,target_season,target_level,rank,player_id,name,first_season,season,level,position,age,sample,sample_unit,ip,likeness/);
    expect(lines[0]).toContain('pop_2b_s_grade');
  });
});

describe('kindred comps --want', () => {
  it('answers a hand-built catcher profile on the given dimensions', async () => {
    const out = await runCli('comps', '--want', 'pop_2b_s=1.90,obp=.360', '--position', 'C', '--store', store, '--format', 'json');
    expect(out.code).toBe(0);
    const result = compsResultSchema.parse(JSON.parse(out.stdout));
    expect(result.query.kind).toBe('want');
    expect(result.query.profile).toEqual({ pop_2b_s: 1.9, obp: 0.36 });
  });

  it('suggests the nearest dimension name for a typo and exits 2', async () => {
    const out = await runCli('comps', '--want', 'pop_2b=1.90', '--position', 'C', '--store', store);
    expect(out.code).toBe(2);
    expect(out.stderr).toMatch(/no dimension "pop_2b" \(did you mean pop_2b_s\?\)/);
  });

  it('needs --position', async () => {
    const out = await runCli('comps', '--want', 'obp=.360', '--store', store);
    expect(out.code).toBe(2);
    expect(out.stderr).toMatch(/--want needs --position/);
  });
});

describe('kindred comps --batch', () => {
  it('answers every target in the order given, one JSON object per line; a failed target gets an error line and exit 1', async () => {
    const c = profiles.groups.get('C');
    const ids: string[] = [];
    for (let i = 0; c && i < c.n && ids.length < 3; i++) {
      const id = profiles.players[c.player[i] as number]?.playerId ?? '';
      if (!ids.includes(id)) ids.push(id);
    }
    const file = join(dir, 'targets.csv');
    await writeFile(file, `player_id,season,level\n${ids[2]},,\nnobody,2020,AA\n${ids[0]},,\n`);
    const out = await runCli('comps', '--batch', file, '--store', store, '--k', '2');
    expect(out.code).toBe(1);
    const lines = out.stdout.trim().split('\n').map((l) => JSON.parse(l) as { query: { player_id: string }; error?: { code: string } });
    expect(lines.map((l) => l.query.player_id)).toEqual([ids[2], 'nobody', ids[0]]);
    expect(lines[1]?.error?.code).toBe('kindred.query.unknownPlayer');
    compsResultSchema.parse(lines[0]);
  });

  it('with --format csv writes CSV rows under one header (not JSON lines); a failed target is named on stderr with its line', async () => {
    const c = profiles.groups.get('C');
    const ids: string[] = [];
    for (let i = 0; c && i < c.n && ids.length < 2; i++) {
      const id = profiles.players[c.player[i] as number]?.playerId ?? '';
      if (!ids.includes(id)) ids.push(id);
    }
    const file = join(dir, 'targets-csv.csv');
    await writeFile(file, `player_id,season,level\n${ids[0]},,\nnobody,2020,AA\n${ids[1]},,\n`);
    const out = await runCli('comps', '--batch', file, '--store', store, '--k', '2', '--format', 'csv');
    expect(out.code).toBe(1);
    const lines = out.stdout.trim().split('\n');
    expect(lines).toHaveLength(1 + 2 + 2);
    expect(lines[0]).toMatch(/^target_player_id,target_first_season,target_season,target_level,rank,player_id,/);
    expect(lines.filter((l) => l.startsWith('target_player_id'))).toHaveLength(1);
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual([ids[0], ids[0], ids[1], ids[1]]);
    expect(out.stderr).toMatch(/targets-csv\.csv:3: nobody: no player matches "nobody"/);
  });
});

describe('usage errors exit 2, missing stores exit 1', () => {
  it.each([
    [['comps', 'x', '--k', '0'], /expected a whole number/],
    [['comps', 'x', '--format', 'xml'], /expected table, json or csv/],
    [['comps', 'x', '--bogus'], /unknown option/],
    [['comps', 'x', '--season', '20'], /four-digit season/],
    [['comps', 'x', '--age', '2530'], /--age.*expected ages like 21-25.*got "2530"/],
    [['comps', 'x', '--age', '100'], /--age.*got "100"/],
    [['comps', 'x', '--pool-season', '20152020'], /--pool-season.*got "20152020"/],
    [['comps', 'x', '--weights', 'obp=2,obp=0'], /--weights.*obp is given more than once/],
    [['comps', 'x', '--k', '1001'], /--k.*from 1 to 1000/],
    [['comps', '--want', 'obp=.300,obp=.400', '--position', 'SS'], /^kindred: --want: obp is given more than once/],
    [['comps', '--want', 'obp=5', '--position', 'SS'], /^kindred: --want: obp=5 is not a plausible value: expected \.\d+ to \.\d+/],
    [['comps', '--want', 'obp=360', '--position', 'SS'], /obp=360 is not a plausible value/],
    [['comps', 'x', '--weights', 'run_sped=0'], /^kindred: --weights: no dimension "run_sped" \(did you mean run_speed_ft_s\?\)/],
  ])('kindred %j', async (argv, message) => {
    const out = await runCli(...argv, '--store', store);
    expect(out.code).toBe(2);
    expect(out.stderr).toMatch(message);
  });

  it('a missing store says how to make one', async () => {
    const out = await runCli('comps', 'x', '--store', join(dir, 'nowhere'));
    expect(out.code).toBe(1);
    expect(out.stderr).toMatch(/no store at .*run kindred build/);
  });
});

describe('kindred dims', () => {
  it('lists the catcher dimensions with labels, units and direction, within 100 columns', async () => {
    const out = await runCli('dims', '--position', 'C');
    expect(out.code).toBe(0);
    expect(out.stdout).toMatch(/pop_2b_s\s+│?\s*Pop time\s+│?\s*s\s+│?\s*lower/);
    for (const line of out.stdout.split('\n')) expect([...line].length).toBeLessThanOrEqual(100);
    expect(out.stdout).not.toContain('fb_mph');
  });

  it('shows, with a store, the k each rate was regressed with beside the fixed table, within 100 columns', async () => {
    const out = await runCli('dims', '--position', 'SS', '--store', store);
    expect(out.code).toBe(0);
    expect(out.stdout).toMatch(/k table\s+│?\s*k fitted/);
    // the demo store is built with the default (table k): K% keeps 60 PA (src/stats/stabilisation.ts)
    expect(out.stdout).toMatch(/k_pct\s+│.*│\s*60\s+│\s*table\s+│/);
    for (const line of out.stdout.split('\n')) expect(line.length).toBeLessThanOrEqual(100);
  });
});

describe('kindred comps: alike and apart agree with the grade grid', () => {
  it('on the hand-built catcher (obp .340, hard-hit 60 grade, pop 70 grade) never calls a wide gap alike or a narrow one apart', async () => {
    const out = await runCli('comps', '--want', 'obp=.340,hard_hit_pct=60g,pop_2b_s=70g', '--position', 'C', '--store', store, '--format', 'json');
    expect(out.code).toBe(0);
    const result = compsResultSchema.parse(JSON.parse(out.stdout));
    expect(result.comps.length).toBeGreaterThan(0);
    for (const c of result.comps) {
      const gap = (name: string): number => {
        const d = c.dimensions.find((x) => x.name === name);
        return Math.abs((d?.target_grade ?? NaN) - (d?.comp_grade ?? NaN));
      };
      // project rule (src/query/alikeApart.ts): alike within 5 grade points, apart at least 10
      for (const n of c.alike) expect(gap(n)).toBeLessThanOrEqual(5);
      for (const n of c.apart) expect(gap(n)).toBeGreaterThanOrEqual(10);
      const shares = c.apart.map((n) => c.dimensions.find((x) => x.name === n)?.share ?? 0);
      expect(shares).toEqual([...shares].sort((a, b) => b - a));
    }
  });
});

describe('kindred comps: playing time of every comp', () => {
  it('shows PA for hitters in JSON, CSV and the table, the season sample the store holds', async () => {
    // the default profiles are windows of 5 seasons: each comp's sample is his window's, summed over its seasons
    const json = await runCli('comps', catcher.id, '--store', store, '--format', 'json');
    const result = compsResultSchema.parse(JSON.parse(json.stdout));
    expect(result.query.window).toBe(5);
    const c = profiles.windows.get(5)?.get('C');
    for (const comp of result.comps) {
      expect(comp.sample_unit).toBe('PA');
      const p = profiles.players.findIndex((x) => x.playerId === comp.player_id);
      const rows = Array.from({ length: c?.n ?? 0 }, (_, i) => i).filter((i) => c?.player[i] === p && c.season[i] === comp.season);
      expect(rows.map((i) => c?.sample[i])).toContain(comp.sample);
    }
    const csv = await runCli('comps', catcher.id, '--store', store, '--format', 'csv');
    expect(csv.stdout.split('\n')[0]).toContain(',age,sample,sample_unit,ip,likeness,');
    const table = await runCli('comps', catcher.id, '--store', store);
    expect(table.stdout).toMatch(/ Age\s+PA\s+Like /);
  });
});

describe('kindred comps: the default window gives way to the season asked for', () => {
  // In the demo league p001292 started through 2021 and also relieved in 2021: that relief season
  // has no 5-season RP window of its own (his window that year is a starter's).
  it('answers a season without a window of its own from single seasons, unless a window is asked for', async () => {
    const out = await runCli('comps', 'p001292', '--season', '2021', '--position', 'RP', '--format', 'json', '--store', store);
    expect(out.code, out.stderr).toBe(0);
    const r = compsResultSchema.parse(JSON.parse(out.stdout));
    expect(r.query.position).toBe('RP');
    expect(r.query.window ?? 1).toBe(1);
    const asked = await runCli('comps', 'p001292', '--season', '2021', '--position', 'RP', '--window', '5', '--store', store);
    expect(asked.code).toBe(1);
    expect(asked.stderr).toMatch(/kindred\.query\.noSeason/);
  });
});
