import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { mostAlikeRow } from '../../src/jobs/mostAlikeRow.ts';
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

describe('mostAlikeRow(store, g, player, choice, distance2)', () => {
  it('takes his most alike season, not the one closest in the calendar', () => {
    // the distance of each row made up for the check: his first season is the most alike
    const first = rows[0] as number;
    const d2 = (r: number): number => (r === first ? 1 : 10 + (g.season[r] as number) - 2000);
    expect(mostAlikeRow(store, g, player, {}, d2)).toBe(first);
    const last = rows[rows.length - 1] as number;
    expect(mostAlikeRow(store, g, player, {}, (r) => (r === last ? 0.5 : 3))).toBe(last);
  });

  it('puts a season at no finite distance last, and breaks ties by the later season, then the higher level', () => {
    const latest = Math.max(...rows.map((i) => g.season[i] as number));
    const row = mostAlikeRow(store, g, player, {}, () => 4);
    expect(g.season[row]).toBe(latest);
    const levels = rows.filter((i) => g.season[i] === latest).map((i) => g.level[i] as number);
    expect(g.level[row]).toBe(Math.max(...levels));
    const first = rows[0] as number;
    expect(mostAlikeRow(store, g, player, {}, (r) => (r === first ? 7 : NaN))).toBe(first);
  });

  it('compares the season asked, and lists his seasons when nothing matches', () => {
    const first = g.season[rows[0] as number] as number;
    const other = rows.find((r) => g.season[r] !== first) as number;
    expect(g.season[mostAlikeRow(store, g, player, { season: first }, (r) => (r === other ? 0 : 5))]).toBe(first);
    expect(() => mostAlikeRow(store, g, player, { season: 1900 }, () => 1)).toThrow(QueryError);
    expect(() => mostAlikeRow(store, g, player, { season: 1900 }, () => 1)).toThrow(/his SP seasons: \d{4} /);
  });
});
