import { describe, expect, it, vi } from 'vitest';
import { partitionCandidates, type CandidateQuery } from '../../src/query/partitionCandidates.ts';
import type { StoredPartition } from '../../src/store/ProfileStore.ts';
import { GuardedIndex } from '../../src/ann/GuardedIndex.ts';
import { partitionVectors } from '../../src/pipeline/buildStore.ts';
import { mulberry32 } from '../ann/randomVectors.ts';

/**
 * Two coverage partitions as a store has them (rows with every dimension; rows without the last three,
 * like seasons without tracking), each with its HNSW index. Reference: a brute-force top 10 by the
 * missing-aware distance written out in the test; recall@10 >= 0.99 per coverage class.
 */
const d = 8;
const nA = 3000;
const nB = 4000;
const n = nA + nB;
const next = mulberry32(5);
const gauss = (): number => Math.sqrt(-2 * Math.log(next() || 1e-12)) * Math.cos(2 * Math.PI * next());
const z = new Float32Array(n * d);
for (let r = 0; r < n; r++) for (let j = 0; j < d; j++) z[r * d + j] = r >= nA && j >= 5 ? NaN : gauss();
const weights = new Float64Array([1, 0.5, 0.8, 0.3, 0.6, 1.2, 0.9, 0.4]);
const sqrtW = Float64Array.from(weights, Math.sqrt);
const params = { M: 16, efConstruction: 100, ef: 128, seed: 100 };
const partition = (dims: number[], rows: Int32Array): StoredPartition => {
  const part = { dims, rows };
  return { dims: Int32Array.from(dims), rows, index: GuardedIndex.build(partitionVectors(z, d, part, sqrtW), dims.length, params), narrow: null };
};
const partitions = [
  partition([0, 1, 2, 3, 4], Int32Array.from({ length: nB }, (_, i) => nA + i)),
  partition([0, 1, 2, 3, 4, 5, 6, 7], Int32Array.from({ length: nA }, (_, i) => i)),
];
const g = { z, d, partitions };
/** The same group with a narrow index on the untracked partition: the tracked rows on its five dimensions. */
const narrowOf = (p: StoredPartition, rows: Int32Array): StoredPartition => ({
  ...p,
  narrow: { rows, index: GuardedIndex.build(partitionVectors(z, d, { dims: [...p.dims], rows }, sqrtW), p.dims.length, params) },
});
const tracked = partitions[1] as StoredPartition;
const gNarrow = { z, d, partitions: [narrowOf(partitions[0] as StoredPartition, tracked.rows), tracked] };

function query(target: Float64Array, minCoverage: number): CandidateQuery {
  let wT = 0;
  for (let j = 0; j < d; j++) if (!Number.isNaN(target[j] as number)) wT += weights[j] as number;
  return { z: target, weights, targetWeight: wT, minCoverage, mask: new Uint8Array(n).fill(1), excluded: 0 };
}

function d2(target: Float64Array, r: number): { d2: number; coverage: number } {
  let sum = 0, shared = 0, all = 0;
  for (let j = 0; j < d; j++) {
    const t = target[j] as number;
    if (Number.isNaN(t)) continue;
    all += weights[j] as number;
    const v = z[r * d + j] as number;
    if (Number.isNaN(v)) continue;
    sum += (weights[j] as number) * (t - v) ** 2;
    shared += weights[j] as number;
  }
  return shared === 0 ? { d2: Infinity, coverage: 0 } : { d2: (sum * all) / shared, coverage: shared / all };
}

const top10 = (target: Float64Array, rows: Iterable<number>, minCoverage: number): number[] =>
  [...rows]
    .map((r) => ({ r, ...d2(target, r) }))
    .filter((s) => s.coverage >= minCoverage && Number.isFinite(s.d2))
    .sort((a, b) => a.d2 - b.d2 || a.r - b.r)
    .slice(0, 10)
    .map((s) => s.r);

const classes: Record<string, (i: number) => Float64Array> = {
  'every dimension': () => Float64Array.from({ length: d }, gauss),
  'without the tracked three': () => Float64Array.from({ length: d }, (_, j) => (j >= 5 ? NaN : gauss())),
  'missing one light dimension': () => Float64Array.from({ length: d }, (_, j) => (j === 3 ? NaN : gauss())),
  'a hand-built profile of 2 to 4 dimensions': (i) => {
    const keep = new Set([i % d, (i * 3 + 1) % d, ...(i % 2 === 0 ? [(i * 5 + 2) % d] : []), ...(i % 3 === 0 ? [(i + 4) % d] : [])]);
    return Float64Array.from({ length: d }, (_, j) => (keep.has(j) ? gauss() : NaN));
  },
};

describe('partitionCandidates(group, query, c)', () => {
  for (const [name, make] of Object.entries(classes)) for (const [how, group] of [['', g], [', with a narrow index', gNarrow]] as const) {
    it(`proposes the true 10 closest rows for targets ${name}${how} (recall@10 >= 0.99 against a brute-force scan)`, () => {
      let hit = 0;
      let total = 0;
      for (let i = 0; i < 40; i++) {
        const target = make(i);
        const found = partitionCandidates(group, query(target, 0.5), 200);
        const truth = top10(target, Array.from({ length: n }, (_, r) => r), 0.5);
        const got = new Set(top10(target, found.rows, 0.5));
        hit += truth.filter((r) => got.has(r)).length;
        total += truth.length;
      }
      expect(total).toBeGreaterThan(0);
      expect(hit / total).toBeGreaterThanOrEqual(0.99);
    });
  }

  it('searches the index of a partition whose dimensions the target has, and scans one it only partly shares', () => {
    const untracked = Float64Array.from({ length: d }, (_, j) => (j >= 5 ? NaN : 0.5));
    // minCoverage 0.5: rows with every dimension share all of this target's weight; both partitions propose
    const found = partitionCandidates(g, query(untracked, 0.5), 50);
    expect(found.viaIndex).toBe(true);
    expect(found.rows.filter((r) => r < nA).length).toBe(50);
    expect(found.rows.filter((r) => r >= nA).length).toBe(50);
    // a two-dimension profile is scanned in both partitions (it has too little of either's weight)
    const want = Float64Array.from({ length: d }, (_, j) => (j === 0 || j === 6 ? 0.5 : NaN));
    expect(partitionCandidates(g, query(want, 0.5), 50).viaIndex).toBe(false);
  });

  it('skips a partition none of whose rows can reach the coverage floor', () => {
    const tracked = Float64Array.from({ length: d }, () => 0.2);
    // rows without the last three share (1 + .5 + .8 + .3 + .6) / 5.7 = 0.56 of the weight: below 0.6
    const found = partitionCandidates(g, query(tracked, 0.6), 50);
    expect(found.rows.every((r) => r < nA)).toBe(true);
  });

  it('proposes the wider partition’s rows from the narrow index for a target with exactly the narrow dimensions, as a scan would', () => {
    const narrowIndex = gNarrow.partitions[0]?.narrow?.index;
    if (!narrowIndex) throw new Error('the test group has no narrow index');
    const search = vi.spyOn(narrowIndex, 'search');
    let same = 0;
    let total = 0;
    for (let i = 0; i < 20; i++) {
      const untracked = Float64Array.from({ length: d }, (_, j) => (j >= 5 ? NaN : gauss()));
      const scanned = new Set(partitionCandidates(g, query(untracked, 0.5), 50).rows.filter((r) => r < nA));
      const found = partitionCandidates(gNarrow, query(untracked, 0.5), 50);
      const fromTracked = found.rows.filter((r) => r < nA);
      expect(fromTracked.length).toBe(50);
      same += fromTracked.filter((r) => scanned.has(r)).length;
      total += 50;
    }
    // HNSW is approximate: nearly all of the scan's 50 closest (source: the recall aim of this project's bench, 0.99)
    expect(same / total).toBeGreaterThanOrEqual(0.97);
    expect(search).toHaveBeenCalledTimes(20);
    search.mockRestore();
  });

  it('scans the wider partition as before when the target has some of its other dimensions', () => {
    const partial = Float64Array.from({ length: d }, (_, j) => (j >= 6 ? NaN : 0.3 * j - 0.5));
    const narrowIndex = gNarrow.partitions[0]?.narrow?.index;
    if (!narrowIndex) throw new Error('the test group has no narrow index');
    const search = vi.spyOn(narrowIndex, 'search');
    expect(partitionCandidates(gNarrow, query(partial, 0.5), 50).rows).toEqual(partitionCandidates(g, query(partial, 0.5), 50).rows);
    expect(search).not.toHaveBeenCalled();
    search.mockRestore();
  });
});
