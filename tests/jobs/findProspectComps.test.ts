import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import type { Outcomes } from '../../src/outlook/Outcomes.ts';
import { DEFAULT_PROSPECT_OPTIONS, findProspectComps, type ProspectOptions } from '../../src/jobs/findProspectComps.ts';
import { summariseOutlook } from '../../src/outlook/summariseOutlook.ts';
import { QueryError, UsageError } from '../../src/errors/KindredError.ts';
import type { TargetRow } from '../../src/query/selectTargetRow.ts';
import { buildSimStore, rowsWhere, type SimStore } from '../outlook/simStore.ts';

let sim: SimStore;
let store: ProfileStore;
let outcomes: Outcomes;
let g: StoredGroup;
let targets: TargetRow[];
const opts = (over: Partial<ProspectOptions> = {}): ProspectOptions => ({ ...DEFAULT_PROSPECT_OPTIONS, ...over });

beforeAll(async () => {
  sim = await buildSimStore();
  store = await openProfileStore(sim.storeDir);
  outcomes = store.outcomes();
  g = store.groups.get('IF') as StoredGroup;
  const aa = store.levels.indexOf('High');
  // High infielders in the last season: the pool holds complete and censored earlier seasons
  targets = rowsWhere(store, 'IF', (i) => g.level[i] === aa && g.season[i] === outcomes.lastSeason && !Number.isNaN(g.age[i] as number));
});
afterAll(() => sim.remove());

describe('findProspectComps(store, outcomes, target, options)', () => {
  it('takes comps only from earlier seasons at the target\u2019s level, within a year of his age, one season per player', () => {
    for (const at of targets.slice(0, 5)) {
      const t = playerTarget(store, at);
      const r = findProspectComps(store, outcomes, t, opts({ includeCensored: true }));
      expect(r.comps.length).toBeGreaterThan(0);
      for (const c of r.comps) {
        expect(c.level).toBe(t.level);
        expect(c.season).toBeLessThan(t.season as number);
        expect(Math.abs((c.age as number) - (t.age as number))).toBeLessThanOrEqual(1);
        expect(c.player_id).not.toBe(r.query.player_id);
      }
      expect(new Set(r.comps.map((c) => c.player_id)).size).toBe(r.comps.length);
      expect(r.comps.map((c) => c.likeness)).toEqual([...r.comps.map((c) => c.likeness)].sort((a, b) => b - a));
    }
  });

  it('leaves out comps no more alike than two unrelated players (likeness 100 / e), and counts them', () => {
    let left = 0;
    for (const at of targets.slice(0, 8)) {
      const t = playerTarget(store, at);
      const r = findProspectComps(store, outcomes, t, opts({ includeCensored: true, comps: { ...DEFAULT_PROSPECT_OPTIONS.comps, k: 200 } }));
      for (const c of r.comps) expect(c.likeness).toBeGreaterThan(100 / Math.E - 0.05);
      expect(r.pool.likeness_floor).toBeCloseTo(100 / Math.E, 1);
      left += r.pool.below_likeness_floor ?? 0;
    }
    expect(left).toBeGreaterThan(0);
  });

  it('warns for a target already established at the top level, not for a prospect', () => {
    const top = store.levels.length - 1;
    const seasonsAtTop = (p: number, upTo: number): number => new Set(rowsWhere(store, 'IF', (i) => g.player[i] === p && g.level[i] === top && (g.season[i] as number) <= upTo).map((r) => g.season[r.row])).size;
    const veteran = rowsWhere(store, 'IF', (i) => g.level[i] === top && !Number.isNaN(g.age[i] as number) && seasonsAtTop(g.player[i] as number, g.season[i] as number) >= 3)[0];
    if (!veteran) throw new Error('no established top-level infielder');
    const r = findProspectComps(store, outcomes, playerTarget(store, veteran), opts());
    expect(r.warnings?.[0]).toMatch(/is established at the top level \(.*, \d+ seasons to \d{4}\)/);
    expect(findProspectComps(store, outcomes, playerTarget(store, targets[0] as TargetRow), opts()).warnings).toEqual([]);
  });

  it('leaves censored comps out of the list and the outlook, and counts the closer ones it left out', () => {
    const t = playerTarget(store, targets[0] as TargetRow);
    const plain = findProspectComps(store, outcomes, t, opts());
    const listed = findProspectComps(store, outcomes, t, opts({ includeCensored: true }));
    expect(plain.comps.every((c) => !c.censored && c.season + 6 <= outcomes.lastSeason)).toBe(true);
    const censored = listed.comps.filter((c) => c.censored);
    expect(censored.length).toBe(plain.outlook.comps_censored);
    expect(plain.outlook.comps_censored).toBeGreaterThan(0);
    for (const c of censored) expect(c.season + 6).toBeGreaterThan(outcomes.lastSeason);
    // every censored player listed is closer than the last comp used
    const last = plain.comps[plain.comps.length - 1];
    for (const c of censored) expect(c.distance).toBeLessThanOrEqual(last?.distance ?? Infinity);
    // the outlook does not change when they are listed
    expect(listed.outlook).toEqual(plain.outlook);
    expect(listed.comps.filter((c) => !c.censored).map((c) => c.player_id)).toEqual(plain.comps.map((c) => c.player_id));
  });

  it('summarises the listed comps\u2019 own outcomes, weighted by likeness', () => {
    const t = playerTarget(store, targets[1] as TargetRow);
    const r = findProspectComps(store, outcomes, t, opts());
    expect(r.outlook.comps_used).toBe(r.comps.length);
    const again = summariseOutlook(r.comps.map((c) => ({ weight: c.likeness, outcome: c.outcome })), 'hitter');
    // likeness is rounded to 0.1 in the listing, so the shares agree to about 0.005
    expect(Math.abs((again.reached_top_level ?? NaN) - (r.outlook.reached_top_level ?? NaN))).toBeLessThan(0.005);
    expect(r.outlook.top_level_seasons.n).toBe(r.comps.length);
    expect('peak_ops_plus' in r.outlook).toBe(true);
  });

  it('gives a base rate over every complete-window player-season of the pool', () => {
    const t = playerTarget(store, targets[0] as TargetRow);
    const r = findProspectComps(store, outcomes, t, opts());
    expect(r.outlook.baseline.player_seasons).toBe(r.pool.complete_window);
    expect(r.pool.complete_window + r.pool.censored).toBe(r.pool.eligible);
    const lvl = store.levels.indexOf(t.level as string);
    let count = 0;
    for (let i = 0; i < g.n; i++) {
      const a = g.age[i] as number;
      if (g.level[i] === lvl && (g.season[i] as number) + 6 <= outcomes.lastSeason && Math.abs(a - (t.age as number)) <= 1 && g.player[i] !== t.player) count++;
    }
    expect(r.pool.complete_window).toBe(count);
  });

  it('with asOf reads comps and outcomes as known then: every window ends by the cut-off', () => {
    const t = playerTarget(store, targets[0] as TargetRow);
    const asOf = outcomes.lastSeason - 8;
    const r = findProspectComps(store, outcomes, t, opts({ asOf, includeCensored: true }));
    expect(r.outlook.as_of_season).toBe(asOf);
    for (const c of r.comps.filter((x) => !x.censored)) expect(c.outcome.window[1]).toBeLessThanOrEqual(asOf);
    for (const c of r.comps.filter((x) => x.censored)) expect(c.outcome.seasons_observed).toBeLessThan(6);
  });

  it('with --path 2 matches players who were at the target\u2019s level of each aligned season', () => {
    const a = store.levels.indexOf('Mid');
    const prev = new Map<number, number>();
    for (let i = 0; i < g.n; i++) if (g.level[i] === a) prev.set((g.player[i] as number) * 10000 + (g.season[i] as number), i);
    const jumped = targets.find((at) => prev.has((g.player[at.row] as number) * 10000 + (g.season[at.row] as number) - 1));
    expect(jumped).toBeDefined();
    const t = playerTarget(store, jumped as TargetRow);
    const r = findProspectComps(store, outcomes, t, opts({ path: 2 }));
    expect(r.query.path.map((s) => s.level)).toEqual([t.level, 'Mid']);
    expect(r.comps.length).toBeGreaterThan(0);
    for (const c of r.comps) {
      expect(c.path?.map((s) => s.level)).toEqual([t.level, 'Mid']);
      expect(c.path?.map((s) => s.season)).toEqual([c.season, c.season - 1]);
    }
    const single = findProspectComps(store, outcomes, t, opts());
    expect(r.pool.eligible).toBeLessThanOrEqual(single.pool.eligible);
  });

  it('refuses a path longer than the target\u2019s run of profiled seasons, a bad horizon and a target without age', () => {
    const t = playerTarget(store, targets[0] as TargetRow);
    expect(() => findProspectComps(store, outcomes, t, opts({ path: 40 }))).toThrow(QueryError);
    expect(() => findProspectComps(store, outcomes, t, opts({ horizon: 0 }))).toThrow(UsageError);
    expect(() => findProspectComps(store, outcomes, { ...t, age: null }, opts())).toThrow(QueryError);
  });
});
