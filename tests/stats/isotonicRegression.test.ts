import { describe, expect, it } from 'vitest';
import { applyIsotonicMap, fitIsotonicMap, isotonicRegression } from '../../src/stats/isotonicRegression.ts';

// Reference: pool-adjacent-violators (Ayer et al. 1955); sequences pooled by hand.
describe('isotonicRegression(y, w)', () => {
  it('pools one violating pair: [1, 3, 2, 4] -> [1, 2.5, 2.5, 4]', () => {
    expect(isotonicRegression([1, 3, 2, 4])).toEqual([1, 2.5, 2.5, 4]);
  });

  it('pools back through earlier blocks: [1, 4, 2, 3, 0] -> [1, 2.25, 2.25, 2.25, 2.25]', () => {
    // 4,2 pool to 3; 3 follows; 0 pools with 3 to 1.5, which violates the block (3, 3), so all four pool: 9 / 4
    const out = isotonicRegression([1, 4, 2, 3, 0]);
    expect(out[0]).toBe(1);
    for (const v of out.slice(1)) expect(v).toBeCloseTo(2.25, 12);
  });

  it('leaves a non-decreasing sequence alone and pools a decreasing one to its mean', () => {
    expect(isotonicRegression([0, 0, 1, 1])).toEqual([0, 0, 1, 1]);
    expect(isotonicRegression([4, 3, 2, 1])).toEqual([2.5, 2.5, 2.5, 2.5]);
  });

  it('uses weights in the pooled means: [3 (w 3), 1 (w 1)] -> 2.5', () => {
    expect(isotonicRegression([3, 1], [3, 1])).toEqual([2.5, 2.5]);
  });
});

describe('fitIsotonicMap / applyIsotonicMap', () => {
  it('maps scores to pooled outcome shares, interpolating between fitted points', () => {
    // scores 0.1..0.4 with outcomes 0, 1, 0, 1: PAV on [0, 1, 0, 1] gives [0, 0.5, 0.5, 1]
    const map = fitIsotonicMap([0.3, 0.1, 0.4, 0.2], [0, 0, 1, 1]);
    expect(map.values).toEqual([0, 0.5, 0.5, 1]);
    expect(applyIsotonicMap(map, 0.05)).toBe(0);
    expect(applyIsotonicMap(map, 0.25)).toBeCloseTo(0.5, 12);
    expect(applyIsotonicMap(map, 0.35)).toBeCloseTo(0.75, 12);
    expect(applyIsotonicMap(map, 0.9)).toBe(1);
  });
});
