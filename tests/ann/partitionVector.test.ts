import { describe, expect, it } from 'vitest';
import { partitionVector } from '../../src/ann/partitionVector.ts';

describe('partitionVector(z, offset, dims, sqrtWeights, out, outOffset)', () => {
  it('keeps the partition dimensions, scales by sqrt(weight) and sets a missing value to 0 (doc example)', () => {
    const out = new Float32Array(4).fill(9);
    partitionVector(Float32Array.from([7, 1, NaN, 2]), 1, [0, 2], Float64Array.from([2, 1, 0.5]), out, 1);
    expect([...out]).toEqual([9, 2, 1, 9]);
  });

  it('gives vectors whose squared L2 is the weighted squared distance on those dimensions', () => {
    const w = Float64Array.from([4, 1, 9]);
    const sqrtW = Float64Array.from(w, Math.sqrt);
    const a = Float64Array.from([0.5, -1, 2]);
    const b = Float64Array.from([1, 1, 0]);
    const va = new Float32Array(3);
    const vb = new Float32Array(3);
    partitionVector(a, 0, [0, 1, 2], sqrtW, va, 0);
    partitionVector(b, 0, [0, 1, 2], sqrtW, vb, 0);
    const l2 = va.reduce((s, x, i) => s + (x - (vb[i] as number)) ** 2, 0);
    const weighted = w.reduce((s, wj, j) => s + wj * ((a[j] as number) - (b[j] as number)) ** 2, 0);
    expect(l2).toBeCloseTo(weighted, 5);
  });
});
