import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import { DEFAULT_COMPS_OPTIONS, findComps } from '../../src/query/findComps.ts';
import { matchPlayers } from '../../src/jobs/matchPlayers.ts';
import type { Target } from '../../src/query/Target.ts';
import { buildSimStore, rowsWhere, type SimStore } from '../outlook/simStore.ts';

let sim: SimStore;
let store: ProfileStore;
let g: StoredGroup;
let target: Target;
const options = { comps: { ...DEFAULT_COMPS_OPTIONS, exact: true }, candidate: {} };

beforeAll(async () => {
  sim = await buildSimStore();
  store = await openProfileStore(sim.storeDir);
  g = store.groups.get('SP') as StoredGroup;
  const top = store.levels.indexOf('Top');
  const rows = rowsWhere(store, 'SP', (i) => g.level[i] === top);
  target = playerTarget(store, rows[Math.floor(rows.length / 2)] as (typeof rows)[number]);
});
afterAll(() => sim.remove());

describe('matchPlayers(store, target, candidate, options)', () => {
  it('gives the top comp rank 1 and his likeness, and agrees with comps on every listed player', () => {
    const comps = findComps(store, target, { ...options.comps, k: 30 });
    for (const c of comps.comps.slice(0, 8)) {
      const m = matchPlayers(store, target, store.playerById.get(c.player_id) as number, { ...options, candidate: { season: c.season, level: c.level } });
      expect(m.candidate.likeness).toBe(c.likeness);
      expect(m.candidate.dimensions).toEqual(c.dimensions);
      expect(m.candidate.rank).toBe(c.rank);
    }
    expect(matchPlayers(store, target, store.playerById.get(comps.comps[0]?.player_id ?? '') as number, { ...options, candidate: { season: comps.comps[0]?.season ?? 0 } }).candidate.more_alike).toBe(0);
  });

  it('computes the percentile as the share of pool players less alike, one row per player', () => {
    const all = findComps(store, target, { ...options.comps, k: 100000 }); // every pool player at his closest season
    const c = all.comps[Math.floor(all.comps.length / 3)];
    if (!c) throw new Error('empty pool');
    const m = matchPlayers(store, target, store.playerById.get(c.player_id) as number, { ...options, candidate: { season: c.season, level: c.level } });
    const others = all.comps.filter((x) => x.player_id !== c.player_id);
    expect(m.candidate.pool_players).toBe(others.length);
    // distances in the listing are rounded to 1e-4: a listed distance above the candidate's is truly
    // above it, one below is truly below; only the listed ties are undecided
    const surelyLess = others.filter((x) => x.distance > c.distance).length;
    const tied = others.filter((x) => x.distance === c.distance).length;
    expect(m.candidate.less_alike).toBeGreaterThanOrEqual(surelyLess);
    expect(m.candidate.less_alike).toBeLessThanOrEqual(surelyLess + tied);
    expect(m.candidate.percentile).toBeCloseTo((100 * m.candidate.less_alike) / m.candidate.pool_players, 1);
  });

  it('compares the candidate at his most alike season, not his calendar-closest, and never names him as the closest other player', () => {
    // a comp is listed at his most alike season; asked without a season, match must take the same one
    const comps = findComps(store, target, { ...options.comps, k: 6 });
    expect(comps.comps.length).toBeGreaterThan(0);
    for (const c of comps.comps) {
      const m = matchPlayers(store, target, store.playerById.get(c.player_id) as number, options);
      expect([m.candidate.season, m.candidate.level]).toEqual([c.season, c.level]);
      expect(m.candidate.likeness).toBe(c.likeness);
      expect(m.closest?.player_id).not.toBe(c.player_id);
    }
    // the top comp's closest other player is the second comp
    const top = comps.comps[0];
    const m = matchPlayers(store, target, store.playerById.get(top?.player_id ?? '') as number, options);
    expect(m.closest?.player_id).toBe(comps.comps[1]?.player_id);
  });

  it('refuses a candidate with no profile in the target\u2019s group', () => {
    const hitters = store.groups.get('IF') as StoredGroup;
    const hitter = hitters.player[0] as number;
    expect(() => matchPlayers(store, target, hitter, options)).toThrow(/has no SP profile/);
  });
});
