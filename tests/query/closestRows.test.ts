import { describe, expect, it } from 'vitest';
import { closestRows } from '../../src/query/closestRows.ts';
import { packPartition } from '../../src/query/packPartition.ts';
import { mulberry32 } from '../ann/randomVectors.ts';

/** Brute force written out here: the missing-aware distance (Gower-style available-case), sorted by (d2, row). */
function brute(target: Float64Array, z: Float32Array, d: number, rows: Int32Array, mask: Uint8Array, w: Float64Array, minCoverage: number, c: number): number[] {
  let wT = 0;
  for (let j = 0; j < d; j++) if (!Number.isNaN(target[j] as number)) wT += w[j] as number;
  const scored: { r: number; d2: number }[] = [];
  for (const r of rows) {
    if (mask[r] !== 1) continue;
    let sum = 0;
    let shared = 0;
    for (let j = 0; j < d; j++) {
      const t = target[j] as number;
      const v = z[r * d + j] as number;
      if (Number.isNaN(t) || Number.isNaN(v) || w[j] === 0) continue;
      sum += (w[j] as number) * (t - v) ** 2;
      shared += w[j] as number;
    }
    if (shared === 0 || shared / wT < minCoverage) continue;
    scored.push({ r, d2: (sum * wT) / shared });
  }
  return scored.sort((a, b) => a.d2 - b.d2 || a.r - b.r).slice(0, c).map((s) => s.r);
}

describe('closestRows(target, packed rows, mask, weights, targetWeight, minCoverage, c)', () => {
  it('returns the worked example: target [0, 1] against [0, 0], [5, 5], [0, 1] gives rows 2 then 0', () => {
    const z = new Float32Array([0, 0, 5, 5, 0, 1]);
    const got = closestRows(new Float64Array([0, 1]), packPartition(z, 2, { rows: new Int32Array([0, 1, 2]), dims: [0, 1] }), new Uint8Array([1, 1, 1]), new Float64Array([1, 1]), 2, 0.5, 2);
    expect(got).toEqual([2, 0]);
  });

  it('equals a brute-force sort of the missing-aware distance, with gaps in rows and target, a mask and a coverage floor', () => {
    const next = mulberry32(11);
    const n = 3000;
    const d = 6;
    const z = new Float32Array(n * d).map(() => (next() < 0.15 ? NaN : next() * 4 - 2));
    const w = new Float64Array([0.5, 1, 0, 2, 0.25, 1]);
    const mask = new Uint8Array(n).map(() => (next() < 0.9 ? 1 : 0));
    const rows = Int32Array.from({ length: n }, (_, i) => i).filter((i) => i % 3 !== 0);
    for (let t = 0; t < 20; t++) {
      const target = Float64Array.from({ length: d }, () => (next() < 0.3 ? NaN : next() * 4 - 2));
      let wT = 0;
      for (let j = 0; j < d; j++) if (!Number.isNaN(target[j] as number)) wT += w[j] as number;
      if (wT === 0) continue;
      const all = [0, 1, 2, 3, 4, 5];
      expect(closestRows(target, packPartition(z, d, { rows, dims: all }), mask, w, wT, 0.5, 25)).toEqual(brute(target, z, d, rows, mask, w, 0.5, 25));
    }
  });

  it('returns nothing when the target has no weighted dimension among those scanned', () => {
    const z = new Float32Array([0, 0, 1, 1]);
    expect(closestRows(new Float64Array([NaN, 1]), packPartition(z, 2, { rows: new Int32Array([0, 1]), dims: [0] }), new Uint8Array([1, 1]), new Float64Array([1, 1]), 1, 0.5, 5)).toEqual([]);
  });
});

describe('closestRows when the heap is full (rows left unread once they cannot come closer)', () => {
  it('equals the brute-force order on many rows with few kept, far rows ahead of near ones', () => {
    const next = mulberry32(29);
    const n = 20000;
    const d = 8;
    // far rows first, so the kept set changes often as nearer rows arrive
    const z = new Float32Array(n * d).map((_, i) => (next() < 0.05 ? NaN : (next() * 2 - 1) * (1 + (n - Math.floor(i / d)) / 2000)));
    const w = new Float64Array([1, 2, 0.5, 1, 1, 0.25, 3, 1]);
    const rows = Int32Array.from({ length: n }, (_, i) => i);
    const mask = new Uint8Array(n).fill(1);
    const all = [0, 1, 2, 3, 4, 5, 6, 7];
    for (let t = 0; t < 5; t++) {
      const target = Float64Array.from({ length: d }, (_, j) => (j === t ? NaN : next() - 0.5));
      let wT = 0;
      for (let j = 0; j < d; j++) if (!Number.isNaN(target[j] as number)) wT += w[j] as number;
      expect(closestRows(target, packPartition(z, d, { rows, dims: all }), mask, w, wT, 0.5, 10)).toEqual(brute(target, z, d, rows, mask, w, 0.5, 10));
    }
  });
});
