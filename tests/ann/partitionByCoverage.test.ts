import { describe, expect, it } from 'vitest';
import { partitionByCoverage } from '../../src/ann/partitionByCoverage.ts';

const N = NaN;

describe('partitionByCoverage(z, n, d)', () => {
  it('splits rows by the families of dimensions they lack (the doc comment example)', () => {
    const z = Float32Array.from([1, 2, 3, 4, 5, 6, 7, 8, N]);
    const parts = partitionByCoverage(z, 3, 3, { patternShare: 0.2 });
    expect(parts.map((p) => ({ dims: p.dims, rows: [...p.rows] }))).toEqual([
      { dims: [0, 1, 2], rows: [0, 1] },
      { dims: [0, 1], rows: [2] },
    ]);
  });

  it('does not split on a dimension that is only rarely missing', () => {
    const rows = 10;
    const z = new Float32Array(rows * 2).fill(1);
    z[1] = N; // one row of ten lacks dim 1: under the 0.2 share
    const parts = partitionByCoverage(z, rows, 2, { patternShare: 0.2 });
    expect(parts).toHaveLength(1);
    expect(parts[0]?.dims).toEqual([0, 1]);
    expect(parts[0]?.rows.length).toBe(rows);
  });

  it('puts every row in exactly one partition, largest partition first', () => {
    const n = 50;
    const z = new Float32Array(n * 3);
    for (let r = 0; r < n; r++) {
      z[r * 3] = r;
      z[r * 3 + 1] = r % 2 === 0 ? N : r;
      z[r * 3 + 2] = r % 3 === 0 ? N : r;
    }
    const parts = partitionByCoverage(z, n, 3);
    const all = parts.flatMap((p) => [...p.rows]).sort((a, b) => a - b);
    expect(all).toEqual(Array.from({ length: n }, (_, i) => i));
    for (let i = 1; i < parts.length; i++) expect(parts[i]?.rows.length).toBeLessThanOrEqual(parts[i - 1]?.rows.length ?? 0);
  });
});
