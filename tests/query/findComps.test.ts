import { beforeAll, describe, expect, it } from 'vitest';
import { simStore, type SimStore } from '../helpers/simStore.ts';
import { effectiveWeights } from '../../src/query/prepareQuery.ts';
import { DEFAULT_COMPS_OPTIONS, findComps, findCompsWithRows } from '../../src/query/findComps.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import { parseWant } from '../../src/query/parseWant.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import type { Target } from '../../src/query/Target.ts';

let s: SimStore;
/** The same league built with narrow indexes over as few as 200 wider rows (the default needs 5,000 and 1,000 targets). */
let narrow: SimStore;
beforeAll(async () => {
  s = await simStore(12000);
  narrow = await simStore(12000, 4242, { narrowMin: { rows: 200, targets: 100 } });
});

const group = (): StoredGroup => {
  const g = s.store.groups.get('IF');
  if (!g) throw new Error('no IF group in the simulated store');
  return g;
};

/** Rows spread evenly over the group, early seasons without tracking included (so coverage varies). */
const sampleRows = (g: StoredGroup, count: number): number[] =>
  Array.from({ length: count }, (_, i) => Math.floor(((i + 0.5) * g.n) / count));

/** Recall@10 of the default search against the exact scan, per coverage class, on IF targets of `store`. */
function recallByClass(store: ProfileStore): void {
  const g = store.groups.get('IF');
  if (!g) throw new Error('no IF group in the simulated store');
  expect(g.n).toBeGreaterThan(2000); // large enough for the index path
  const W = g.redundancy.reduce((a, b) => a + b, 0);
  const share = (r: number): number => {
    let have = 0;
    for (let j = 0; j < g.d; j++) if (!Number.isNaN(g.z[r * g.d + j] as number)) have += g.redundancy[j] as number;
    return have / W;
  };
  const all = Array.from({ length: g.n }, (_, r) => r);
  const spread = (rows: number[], count: number): number[] => Array.from({ length: Math.min(count, rows.length) }, (_, i) => rows[Math.floor(((i + 0.5) * rows.length) / count)] as number);
  const full = spread(all.filter((r) => share(r) === 1), 20);
  const untracked = spread(all.filter((r) => share(r) < 0.75), 20);
  const names = g.dims.map((d) => d.name);
  const classes: [string, Target[]][] = [
    ['every dimension', full.map((row) => playerTarget(store, { group: 'IF', row }))],
    ['without tracking', untracked.map((row) => playerTarget(store, { group: 'IF', row }))],
    [
      'hand-built, 2 to 4 dimensions',
      full.map((row, i) => {
        const t = playerTarget(store, { group: 'IF', row });
        const keep = new Set([names[i % g.d], names[(i * 7 + 3) % g.d], ...(i % 2 === 0 ? [names[(i * 5 + 1) % g.d]] : [])]);
        return { ...t, kind: 'want' as const, player: -1, row: -1, z: t.z.map((v, j) => (keep.has(names[j]) ? v : NaN)), raw: t.raw.map((v, j) => (keep.has(names[j]) ? v : NaN)) };
      }),
    ],
  ];
  for (const [name, targets] of classes) {
    expect(targets.length, name).toBeGreaterThan(5);
    let hit = 0;
    let total = 0;
    let viaIndex = 0;
    for (const target of targets) {
      const fast = findComps(store, target, DEFAULT_COMPS_OPTIONS);
      const exact = findComps(store, target, { ...DEFAULT_COMPS_OPTIONS, exact: true });
      expect(exact.query.method).toBe('exact');
      if (fast.query.method === 'hnsw') viaIndex++;
      const truth = new Set(exact.comps.map((c) => c.player_id));
      hit += fast.comps.filter((c) => truth.has(c.player_id)).length;
      total += truth.size;
    }
    expect(hit / total, name).toBeGreaterThanOrEqual(0.99);
    // seasons without tracking are the bulk of the group: their own partition's index proposes them
    if (name === 'without tracking') expect(viaIndex).toBe(targets.length);
  }
}

describe('findComps(store, target, options)', () => {
  it('never returns the target player and returns each comp player once, closest first', () => {
    const g = group();
    for (const row of sampleRows(g, 15)) {
      const target = playerTarget(s.store, { group: 'IF', row });
      const result = findComps(s.store, target, DEFAULT_COMPS_OPTIONS);
      const ids = result.comps.map((c) => c.player_id);
      expect(ids).not.toContain(result.query.player_id);
      expect(new Set(ids).size).toBe(ids.length);
      expect(result.comps.map((c) => c.rank)).toEqual(ids.map((_, i) => i + 1));
      for (let i = 1; i < result.comps.length; i++) {
        expect(result.comps[i]?.distance).toBeGreaterThanOrEqual(result.comps[i - 1]?.distance ?? 0);
        expect(result.comps[i]?.likeness).toBeLessThanOrEqual(result.comps[i - 1]?.likeness ?? 100);
      }
    }
  });

  it('finds the same comps as the exact scan for targets of every coverage class (recall@10 at least 0.99 each; reference: the exact scan)', () => {
    recallByClass(s.store);
  });

  it('finds the same comps with narrow indexes, and untracked targets meet tracked rows through them (reference: the exact scan)', () => {
    const g = narrow.store.groups.get('IF');
    expect(g?.partitions.some((p) => p.narrow !== null)).toBe(true);
    recallByClass(narrow.store);
  });

  it('ranks exactly by the weighted missing-aware distance computed independently here', () => {
    const g = group();
    const row = sampleRows(g, 7)[6] as number;
    const target = playerTarget(s.store, { group: 'IF', row });
    const { result, rows } = findCompsWithRows(s.store, target, { ...DEFAULT_COMPS_OPTIONS, exact: true, k: 5, allSeasons: true });
    const w = effectiveWeights(g, DEFAULT_COMPS_OPTIONS);
    const d2 = (r: number): number => {
      let sum = 0, shared = 0, all = 0;
      for (let j = 0; j < g.d; j++) {
        const t = target.z[j] as number;
        if (Number.isNaN(t)) continue;
        all += w[j] as number;
        const c = g.z[r * g.d + j] as number;
        if (Number.isNaN(c)) continue;
        sum += (w[j] as number) * (t - c) ** 2;
        shared += w[j] as number;
      }
      return shared / all >= 0.5 ? (sum * all) / shared : Infinity;
    };
    const brute = Array.from({ length: g.n }, (_, r) => r)
      .filter((r) => g.player[r] !== target.player)
      .sort((a, b) => d2(a) - d2(b))
      .slice(0, 5);
    expect(rows.map(d2)).toEqual(brute.map(d2));
    expect(result.comps[0]?.distance).toBeCloseTo(Math.sqrt(d2(brute[0] as number)), 3);
  });

  it('keeps to the pool filters: levels, ages and bats', () => {
    const g = group();
    const target = playerTarget(s.store, { group: 'IF', row: sampleRows(g, 3)[1] as number });
    const result = findComps(s.store, target, { ...DEFAULT_COMPS_OPTIONS, filter: { levels: ['High', 'Elite'], ageMin: 22, ageMax: 25, bats: ['L'] } });
    expect(result.comps.length).toBeGreaterThan(0);
    for (const c of result.comps) {
      expect(['High', 'Elite']).toContain(c.level);
      expect(c.age).toBeGreaterThanOrEqual(22);
      expect(c.age).toBeLessThanOrEqual(25);
      const p = s.store.players[s.store.playerById.get(c.player_id) ?? -1];
      expect(p?.bats).toBe('L');
    }
    expect(result.pool.eligible).toBeLessThan(result.pool.group_size);
  });

  it('answers a hand-built profile on the given dimensions only', () => {
    const target = parseWant(s.store, 'pop_2b_s=1.90,obp=.340', { position: 'C' });
    const result = findComps(s.store, target, DEFAULT_COMPS_OPTIONS);
    expect(result.query.kind).toBe('want');
    expect(Object.keys(result.query.profile).sort()).toEqual(['obp', 'pop_2b_s']);
    for (const c of result.comps) {
      const used = c.dimensions.filter((d) => !d.missing).map((d) => d.name).sort();
      expect(used).toEqual(['obp', 'pop_2b_s']);
      expect(c.dimensions.reduce((a, d) => a + d.share, 0)).toBeCloseTo(1, 9);
    }
  });

  it('allows several seasons of one player with allSeasons', () => {
    const g = group();
    const target = playerTarget(s.store, { group: 'IF', row: sampleRows(g, 5)[2] as number });
    const result = findComps(s.store, target, { ...DEFAULT_COMPS_OPTIONS, k: 40, allSeasons: true, exact: true });
    const ids = result.comps.map((c) => c.player_id);
    expect(new Set(ids).size).toBeLessThan(ids.length);
  });
});
