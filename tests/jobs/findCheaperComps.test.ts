import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import { DEFAULT_COMPS_OPTIONS } from '../../src/query/findComps.ts';
import { findCheaperComps, salaryOf } from '../../src/jobs/findCheaperComps.ts';
import { valueFrontier } from '../../src/jobs/valueFrontier.ts';
import { parseWant } from '../../src/query/parseWant.ts';
import { UsageError } from '../../src/errors/KindredError.ts';
import type { Target } from '../../src/query/Target.ts';
import { buildSimStore, rowsWhere, type SimStore } from '../outlook/simStore.ts';

let sim: SimStore;
let store: ProfileStore;
let target: Target;
let targetSalary: number;

beforeAll(async () => {
  sim = await buildSimStore();
  store = await openProfileStore(sim.storeDir);
  const g = store.groups.get('OF') as StoredGroup;
  const paid = rowsWhere(store, 'OF', (i) => (salaryOf(store, g.player[i] as number, g.season[i] as number) ?? 0) > 5_000_000);
  const at = paid[paid.length - 1];
  if (!at) throw new Error('no well-paid outfielder in the test league');
  target = playerTarget(store, at);
  targetSalary = salaryOf(store, target.player, target.season as number) as number;
});
afterAll(() => sim.remove());

describe('findCheaperComps(store, target, options)', () => {
  it('keeps only comps with a known salary at or under a share of the target\u2019s', () => {
    const r = findCheaperComps(store, target, { comps: { ...DEFAULT_COMPS_OPTIONS, k: 15 }, limit: { kind: 'max-share', share: 0.5 } });
    expect(r.pool.salary.target_salary_usd).toBe(targetSalary);
    expect(r.pool.salary.limit_usd).toBe(Math.round(targetSalary / 2));
    expect(r.comps.length).toBeGreaterThan(0);
    for (const c of r.comps) {
      expect(c.salary_usd).toBeLessThanOrEqual(targetSalary / 2);
      expect(c.salary_usd).toBe(salaryOf(store, store.playerById.get(c.player_id) as number, c.season));
      expect(c.likeness_per_million).toBeCloseTo(c.likeness / (c.salary_usd / 1e6), 1);
    }
  });

  it('counts the eligible player-seasons left out for having no salary or a salary over the limit', () => {
    const r = findCheaperComps(store, target, { comps: DEFAULT_COMPS_OPTIONS, limit: { kind: 'max-salary', usd: 1_000_000 } });
    const g = store.groups.get('OF') as StoredGroup;
    let none = 0;
    let over = 0;
    let under = 0;
    for (let i = 0; i < g.n; i++) {
      if (g.player[i] === target.player) continue;
      const s = salaryOf(store, g.player[i] as number, g.season[i] as number);
      if (s === undefined) none++;
      else if (s > 1_000_000) over++;
      else under++;
    }
    expect(r.pool.salary).toMatchObject({ rule: 'max-salary', limit_usd: 1_000_000, share: null, without_salary: none, over_limit: over, under_limit: under });
    expect(none).toBeGreaterThan(0);
    expect(r.pool.salary.without_salary + r.pool.salary.over_limit + r.pool.salary.under_limit).toBe(r.pool.group_size - g.player.filter((p) => p === target.player).length);
  });

  it('marks as frontier exactly the listed comps that no comp ranked above them beats on salary', () => {
    const r = findCheaperComps(store, target, { comps: { ...DEFAULT_COMPS_OPTIONS, k: 20 }, limit: { kind: 'max-share', share: 0.8 } });
    expect(r.comps.map((c) => c.frontier)).toEqual(valueFrontier(r.comps.map((c) => -c.rank), r.comps.map((c) => c.salary_usd)));
    r.comps.forEach((c, i) => expect(c.frontier).toBe(r.comps.slice(0, i).every((above) => above.salary_usd > c.salary_usd)));
    expect(r.comps[0]?.frontier).toBe(true); // the most alike is never beaten on likeness
    const cheapest = Math.min(...r.comps.map((c) => c.salary_usd));
    const bestCheapest = Math.max(...r.comps.filter((c) => c.salary_usd === cheapest).map((c) => c.likeness));
    expect(r.comps.find((c) => c.salary_usd === cheapest && c.likeness === bestCheapest)?.frontier).toBe(true);
  });

  it('makes --max-share a usage error when the target has no salary, but takes --max-salary', () => {
    const want = parseWant(store, 'obp=.360,iso=.200', { position: 'CF' });
    expect(() => findCheaperComps(store, want, { comps: DEFAULT_COMPS_OPTIONS, limit: { kind: 'max-share', share: 0.5 } })).toThrow(UsageError);
    const r = findCheaperComps(store, want, { comps: DEFAULT_COMPS_OPTIONS, limit: { kind: 'max-salary', usd: 2_000_000 } });
    expect(r.pool.salary.target_salary_usd).toBeNull();
    expect(r.comps.every((c) => c.salary_usd <= 2_000_000)).toBe(true);
  });
});
