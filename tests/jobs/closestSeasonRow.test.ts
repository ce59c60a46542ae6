import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { closestSeasonRow } from '../../src/jobs/closestSeasonRow.ts';
import { QueryError } from '../../src/errors/KindredError.ts';
import { buildSimStore, type SimStore } from '../outlook/simStore.ts';

let sim: SimStore;
let store: ProfileStore;
let g: StoredGroup;
/** A pitcher with at least three profiled seasons, and his rows. */
let player = -1;
let rows: number[] = [];

beforeAll(async () => {
  sim = await buildSimStore({ seed: 78, firstSeason: 2010, lastSeason: 2022, targetPlayerSeasons: 3000 });
  store = await openProfileStore(sim.storeDir);
  g = store.groups.get('SP') as StoredGroup;
  const byPlayer = new Map<number, number[]>();
  for (let i = 0; i < g.n; i++) byPlayer.set(g.player[i] as number, [...(byPlayer.get(g.player[i] as number) ?? []), i]);
  for (const [p, r] of byPlayer) {
    if (new Set(r.map((i) => g.season[i])).size >= 3) {
      player = p;
      rows = r;
      break;
    }
  }
});
afterAll(() => sim.remove());

describe('closestSeasonRow(store, g, player, reference, choice)', () => {
  it('picks the season closest to the reference', () => {
    const seasons = rows.map((i) => g.season[i] as number);
    const mid = [...seasons].sort((a, b) => a - b)[1] as number;
    expect(g.season[closestSeasonRow(store, g, player, mid, {})]).toBe(mid);
    expect(g.season[closestSeasonRow(store, g, player, 1900, {})]).toBe(Math.min(...seasons));
  });

  it('takes his latest season, at his highest level, without a reference', () => {
    const latest = Math.max(...rows.map((i) => g.season[i] as number));
    const row = closestSeasonRow(store, g, player, null, {});
    expect(g.season[row]).toBe(latest);
    const levels = rows.filter((i) => g.season[i] === latest).map((i) => g.level[i] as number);
    expect(g.level[row]).toBe(Math.max(...levels));
  });

  it('narrows to a season or a level, and lists his seasons when nothing matches', () => {
    const first = g.season[rows[0] as number] as number;
    expect(g.season[closestSeasonRow(store, g, player, 3000, { season: first })]).toBe(first);
    expect(() => closestSeasonRow(store, g, player, null, { season: 1900 })).toThrow(QueryError);
    expect(() => closestSeasonRow(store, g, player, null, { season: 1900 })).toThrow(/his SP seasons: \d{4} /);
  });
});
