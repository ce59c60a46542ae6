import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadProfileStore } from '../../src/query/loadProfileStore.ts';
import type { ProfileStore, StoredGroup } from '../../src/query/ProfileStore.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import { DEFAULT_COMPS_OPTIONS, effectiveWeights, findComps } from '../../src/query/findComps.ts';
import { matchPlayers } from '../../src/outlook/matchPlayers.ts';
import { poolPercentile } from '../../src/outlook/poolPercentile.ts';
import { closestSeasonRow } from '../../src/outlook/closestSeasonRow.ts';
import { QueryError } from '../../src/errors/KindredError.ts';
import type { Target } from '../../src/query/Target.ts';
import { buildSimStore, rowsWhere, type SimStore } from './simStore.ts';

let sim: SimStore;
let store: ProfileStore;
let g: StoredGroup;
let target: Target;
const options = { comps: { ...DEFAULT_COMPS_OPTIONS, exact: true }, candidate: {} };

beforeAll(async () => {
  sim = await buildSimStore();
  store = await loadProfileStore(sim.storeDir);
  g = store.groups.get('SP') as StoredGroup;
  const mlb = store.levels.indexOf('MLB');
  const rows = rowsWhere(store, 'SP', (i) => g.level[i] === mlb);
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
    const less = others.filter((x) => x.distance > c.distance).length;
    expect(m.candidate.pool_players).toBe(others.length);
    // distances in the listing are rounded to 1e-4: allow the ties that rounding makes
    expect(Math.abs(m.candidate.less_alike - less)).toBeLessThanOrEqual(2);
    expect(m.candidate.percentile).toBeCloseTo((100 * m.candidate.less_alike) / m.candidate.pool_players, 1);
  });

  it('poolPercentile puts a candidate closer than everyone at 100 and one farther than everyone at 0', () => {
    const w = effectiveWeights(g, DEFAULT_COMPS_OPTIONS);
    const other = g.player.find((p) => p !== target.player) as number;
    expect(poolPercentile(store, g, target.z, target.player, other, 0, w, {}, 0.5).percentile).toBe(100);
    expect(poolPercentile(store, g, target.z, target.player, other, Infinity, w, {}, 0.5).percentile).toBe(0);
  });

  it('defaults the candidate to his season closest to the target\u2019s, and narrows it with a season', () => {
    const other = g.player[0] as number;
    const rows: number[] = [];
    for (let i = 0; i < g.n; i++) if (g.player[i] === other) rows.push(i);
    const row = closestSeasonRow(store, g, other, target.season, {});
    const gap = Math.min(...rows.map((i) => Math.abs((g.season[i] as number) - (target.season as number))));
    expect(Math.abs((g.season[row] as number) - (target.season as number))).toBe(gap);
    const first = g.season[rows[0] as number] as number;
    expect(g.season[closestSeasonRow(store, g, other, target.season, { season: first })]).toBe(first);
    expect(() => closestSeasonRow(store, g, other, target.season, { season: 1900 })).toThrow(QueryError);
  });

  it('refuses a candidate with no profile in the target\u2019s group', () => {
    const hitters = store.groups.get('IF') as StoredGroup;
    const hitter = hitters.player[0] as number;
    expect(() => matchPlayers(store, target, hitter, options)).toThrow(/has no SP profile/);
  });
});
