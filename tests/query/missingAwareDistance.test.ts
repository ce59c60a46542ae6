import { distance } from 'ml-distance';
import { describe, expect, it } from 'vitest';
import { missingAwareDistance, targetWeight } from '../../src/query/missingAwareDistance.ts';

describe('missingAwareDistance(target, candidate, offset, weights, W_T)', () => {
  it('equals the squared Euclidean distance when nothing is missing and weights are 1 (reference: ml-distance)', () => {
    const t = Float64Array.from([0.5, -1, 2, 0]);
    const c = Float32Array.from([1, 1, -1, 0.25]);
    const w = Float64Array.from([1, 1, 1, 1]);
    const p = missingAwareDistance(t, c, 0, w, targetWeight(t, w));
    expect(p.d2).toBeCloseTo(distance.squaredEuclidean([...t], [...c]), 6);
    expect(p.coverage).toBe(1);
  });

  it('leaves out a dimension missing on either side and rescales to the target weight (worked example in the doc comment)', () => {
    const t = Float64Array.from([0, 1, NaN]);
    const c = Float32Array.from([1, 1, 2]);
    const w = Float64Array.from([1, 1, 1]);
    expect(missingAwareDistance(t, c, 0, w, targetWeight(t, w))).toEqual({ d2: 1, coverage: 1 });
    const t2 = Float64Array.from([0, 1, 3]);
    const c2 = Float32Array.from([1, NaN, 3]);
    // S = {0, 2}: sum 1, W_S = 2, W_T = 3 -> d2 = 1 * 3 / 2, coverage 2/3
    const p = missingAwareDistance(t2, c2, 0, w, targetWeight(t2, w));
    expect(p.d2).toBeCloseTo(1.5, 12);
    expect(p.coverage).toBeCloseTo(2 / 3, 12);
  });

  it('never treats a missing value as average: a candidate missing a dimension is not pulled toward 0 on it', () => {
    const t = Float64Array.from([2, 2]);
    const w = Float64Array.from([1, 1]);
    const missing = missingAwareDistance(t, Float32Array.from([2, NaN]), 0, w, 2);
    const average = missingAwareDistance(t, Float32Array.from([2, 0]), 0, w, 2);
    expect(missing.d2).toBe(0);
    expect(average.d2).toBe(4);
  });

  it('reads a candidate at an offset in a row-major matrix and applies the weights', () => {
    const m = Float32Array.from([9, 9, 1, 3]);
    const p = missingAwareDistance(Float64Array.from([0, 0]), m, 2, Float64Array.from([2, 0.5]), 2.5);
    expect(p.d2).toBeCloseTo(2 * 1 + 0.5 * 9, 6);
  });

  it('gives coverage 0 and an infinite distance when nothing is shared', () => {
    const p = missingAwareDistance(Float64Array.from([1, NaN]), Float32Array.from([NaN, 1]), 0, Float64Array.from([1, 1]), 1);
    expect(p.coverage).toBe(0);
    expect(p.d2).toBe(Infinity);
  });
});
