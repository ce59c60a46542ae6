import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { runCli } from '../helpers/runCli.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { buildSimStore, type SimStore } from '../outlook/simStore.ts';
import { cheaperResultSchema } from '../outlook/outlookContract.ts';

let sim: SimStore;
let store: string;
/** A well-paid Top infielder (id, season, salary) and a prospect with no salary. */
let star = { id: '', season: 0, salary: 0 };
let unpaid = '';

beforeAll(async () => {
  sim = await buildSimStore();
  store = sim.storeDir;
  const s = await openProfileStore(store);
  const g = s.groups.get('IF');
  if (!g) throw new Error('no infielders');
  for (let i = 0; i < g.n; i++) {
    const p = g.player[i] as number;
    const salary = s.salaries.get(p)?.get(g.season[i] as number);
    if (salary !== undefined && salary > star.salary) star = { id: s.players[p]?.playerId ?? '', season: g.season[i] as number, salary };
    if (s.salaries.get(p) === undefined) unpaid = s.players[p]?.playerId ?? '';
  }
});
afterAll(() => sim.remove());

const json = async (...args: string[]): Promise<ReturnType<typeof cheaperResultSchema.parse>> => {
  const out = await runCli('cheaper', ...args, '--store', store, '--format', 'json');
  expect(out.stderr).toBe('');
  expect(out.code).toBe(0);
  return cheaperResultSchema.parse(JSON.parse(out.stdout));
};

describe('kindred cheaper <player>', () => {
  it('defaults to half the target\u2019s salary, echoes the pool counts and marks the frontier', async () => {
    const r = await json(star.id, '--season', String(star.season), '--recent', 'all', '--level-span', 'all');
    expect(r.query).toMatchObject({ player_id: star.id, season: star.season });
    expect(r.pool.salary).toMatchObject({ rule: 'max-share', share: 0.5, target_salary_usd: star.salary, limit_usd: Math.round(star.salary / 2) });
    expect(r.pool.salary.without_salary).toBeGreaterThan(0);
    expect(r.comps.length).toBeGreaterThan(0);
    expect(r.comps.every((c) => c.salary_usd <= star.salary / 2)).toBe(true);
    expect(r.comps[0]?.frontier).toBe(true);
  });

  it('draws by default from his level, his season and the two before it, at his position with half his PA', async () => {
    const r = await json(star.id, '--season', String(star.season), '--k', '25');
    expect(r.comps.length).toBeGreaterThan(0);
    const level = r.query.level;
    for (const c of r.comps) {
      expect(c.level).toBe(level);
      expect(c.season).toBeGreaterThanOrEqual(star.season - 2);
      expect(c.season).toBeLessThanOrEqual(star.season);
      expect(c.position).toBe(r.query.position);
      expect(c.sample).toBeGreaterThanOrEqual(r.pool.sample_floor?.min ?? Infinity);
    }
    expect(r.pool.filters).toMatchObject({ levels: [level], season_from: star.season - 2, season_to: star.season });
    // --recent all and --level-span all give the older seasons and other levels back
    const wide = await json(star.id, '--season', String(star.season), '--recent', 'all', '--level-span', 'all');
    expect(wide.pool.eligible).toBeGreaterThan(r.pool.eligible);
  });

  it('puts only comps above the unrelated likeness on the frontier, and scores value without rewarding the minimum salary', async () => {
    const r = await json(star.id, '--season', String(star.season), '--k', '40', '--recent', 'all', '--level-span', 'all', '--sample-floor', '0', '--min-coverage', '0');
    expect(r.pool.salary.likeness_floor).toBeCloseTo(100 / Math.E, 1);
    for (const c of r.comps) {
      if (c.frontier) expect(c.likeness).toBeGreaterThan(100 / Math.E);
      expect(c.above_likeness_floor).toBe(c.likeness > 100 / Math.E);
      if (!c.above_likeness_floor) expect(c.value_score).toBe(0);
    }
    // value never rises as likeness falls at the same salary or more (the likeness-per-$1M flaw)
    for (const a of r.comps) for (const b of r.comps) {
      if (a.likeness > b.likeness && a.salary_usd <= b.salary_usd) expect(a.value_score ?? 0).toBeGreaterThanOrEqual(b.value_score ?? 0);
    }
  });

  it('--max-salary sets an absolute limit (commas allowed)', async () => {
    const r = await json(star.id, '--season', String(star.season), '--max-salary', '1,500,000', '--k', '5');
    expect(r.pool.salary).toMatchObject({ rule: 'max-salary', limit_usd: 1_500_000, share: null });
    expect(r.comps.every((c) => c.salary_usd <= 1_500_000)).toBe(true);
  });

  it('prints a table with salaries and the frontier', async () => {
    const out = await runCli('cheaper', star.id, '--season', String(star.season), '--store', store, '--k', '5');
    expect(out.code).toBe(0);
    expect(out.stdout).toMatch(/^Cheaper comps for .*; salary \$[\d,]+/);
    expect(out.stdout).toMatch(/Left out: [\d,]+ paid more, [\d,]+ without a known salary/);
    expect(out.stdout).toMatch(/\$[\d,]+ +[\d.]+ +yes/);
  });

  it('--format csv keeps the comps CSV convention, with plain whole-dollar salaries, the value score and the frontier flags', async () => {
    const out = await runCli('cheaper', star.id, '--season', String(star.season), '--store', store, '--format', 'csv', '--k', '4', '--recent', 'all');
    expect(out.code).toBe(0);
    const rows: string[][] = parse(out.stdout);
    // cheaper answers single seasons by default: the comps CSV of single seasons
    const comps: string[][] = parse((await runCli('comps', star.id, '--season', String(star.season), '--store', store, '--format', 'csv', '--k', '1', '--window', '1')).stdout);
    const head = rows[0] ?? [];
    const own = ['salary_usd', 'value_score', 'likeness_per_million', 'frontier', 'above_likeness_floor'];
    // the comps columns in the same order, the salary columns before alike and apart
    expect(head.filter((h) => !own.includes(h))).toEqual(comps[0]);
    expect(head.slice(head.indexOf('coverage') + 1, head.indexOf('alike'))).toEqual(own);
    const col = head.indexOf('salary_usd');
    expect(rows.slice(1).every((r) => /^\d+$/.test(r[col] ?? ''))).toBe(true);
    expect(rows.slice(1).every((r) => ['true', 'false'].includes(r[head.indexOf('frontier')] ?? ''))).toBe(true);
    expect(rows).toHaveLength(5);
  });

  it('takes a --want profile with --max-salary', async () => {
    const r = await json('--want', 'obp=.350,iso=.180', '--position', 'SS', '--max-salary', '3000000');
    expect(r.query.kind).toBe('want');
    expect(r.pool.salary.target_salary_usd).toBeNull();
  });

  it('--batch writes one JSON line per target', async () => {
    const file = join(sim.dir, 'paid.csv');
    await writeFile(file, `player_id,season\n${star.id},${star.season}\n${unpaid},\n`);
    const out = await runCli('cheaper', '--batch', file, '--store', store, '--k', '2');
    const lines = out.stdout.trim().split('\n').map((l) => JSON.parse(l) as { error?: { code: string } });
    expect(cheaperResultSchema.safeParse(lines[0]).success).toBe(true);
    expect(lines[1]?.error?.code).toBe('kindred.usage.badOption'); // no salary for --max-share
    expect(out.code).toBe(1);
  });

  it('exits 2 for --max-share without a target salary, for both limits, and for a bad amount', async () => {
    const noSalary = await runCli('cheaper', unpaid, '--store', store, '--max-share', '0.5');
    expect(noSalary.code).toBe(2);
    expect(noSalary.stderr).toMatch(/--max-share needs the target's salary.*give --max-salary/);
    expect((await runCli('cheaper', star.id, '--store', store, '--max-share', '0.5', '--max-salary', '100')).code).toBe(2);
    expect((await runCli('cheaper', star.id, '--store', store, '--max-salary', 'lots')).code).toBe(2);
    expect((await runCli('cheaper', '--want', 'obp=.350', '--position', 'SS', '--store', store)).code).toBe(2);
  });
});
