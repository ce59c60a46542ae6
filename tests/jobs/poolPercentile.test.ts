import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import { effectiveWeights } from '../../src/query/prepareQuery.ts';
import { DEFAULT_COMPS_OPTIONS, findComps } from '../../src/query/findComps.ts';
import { missingAwareDistance, targetWeight } from '../../src/query/missingAwareDistance.ts';
import { poolPercentile } from '../../src/jobs/poolPercentile.ts';
import type { Target } from '../../src/query/Target.ts';
import { buildSimStore, rowsWhere, type SimStore } from '../outlook/simStore.ts';

let sim: SimStore;
let store: ProfileStore;
let g: StoredGroup;
let target: Target;
let w: Float64Array;

beforeAll(async () => {
  sim = await buildSimStore({ seed: 77, firstSeason: 2010, lastSeason: 2022, targetPlayerSeasons: 4000 });
  store = await openProfileStore(sim.storeDir);
  g = store.groups.get('OF') as StoredGroup;
  const rows = rowsWhere(store, 'OF', (i) => g.level[i] === store.levels.indexOf('Elite'));
  target = playerTarget(store, rows[0] as (typeof rows)[number]);
  w = effectiveWeights(g, DEFAULT_COMPS_OPTIONS);
});
afterAll(() => sim.remove());

describe('poolPercentile(store, g, targetZ, targetPlayer, candidatePlayer, candidateD2, weights, filter, minCoverage)', () => {
  it('counts each pool player once, at his closest season, as the comps query does', () => {
    const all = findComps(store, target, { ...DEFAULT_COMPS_OPTIONS, exact: true, k: 100000 });
    const pick = all.comps[Math.floor(all.comps.length / 2)];
    if (!pick) throw new Error('empty pool');
    const candidate = store.playerById.get(pick.player_id) as number;
    let row = -1;
    for (let i = 0; i < g.n; i++) if (g.player[i] === candidate && g.season[i] === pick.season && store.levels[g.level[i] as number] === pick.level) row = i;
    const d2 = missingAwareDistance(target.z, g.z, row * g.d, w, targetWeight(target.z, w)).d2;
    const s = poolPercentile(store, g, target.z, target.player, candidate, d2, w, {}, DEFAULT_COMPS_OPTIONS.minCoverage);
    expect(s.players).toBe(all.comps.length - 1);
    expect(s.moreAlike).toBe(pick.rank - 1);
    expect(s.moreAlike + s.lessAlike).toBeLessThanOrEqual(s.players);
    expect(s.percentile).toBeCloseTo((100 * s.lessAlike) / s.players, 10);
  });

  it('puts a candidate closer than everyone at 100 and one farther than everyone at 0', () => {
    const other = g.player.find((p) => p !== target.player) as number;
    expect(poolPercentile(store, g, target.z, target.player, other, 0, w, {}, 0.5).percentile).toBe(100);
    expect(poolPercentile(store, g, target.z, target.player, other, Infinity, w, {}, 0.5).percentile).toBe(0);
  });

  it('follows the pool filters and is NaN for an empty pool', () => {
    const other = g.player.find((p) => p !== target.player) as number;
    const narrow = poolPercentile(store, g, target.z, target.player, other, 1, w, { levels: ['Elite'] }, 0.5);
    const wide = poolPercentile(store, g, target.z, target.player, other, 1, w, {}, 0.5);
    expect(narrow.players).toBeLessThan(wide.players);
    expect(poolPercentile(store, g, target.z, target.player, other, 1, w, { seasonFrom: 3000 }, 0.5).percentile).toBeNaN();
  });
});
