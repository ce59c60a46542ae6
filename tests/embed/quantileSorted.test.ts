import { describe, expect, it } from 'vitest';
import { quantileSorted } from '../../src/embed/quantileSorted.ts';

describe('quantileSorted(sorted, p) uses Hyndman and Fan definition 7 (R default)', () => {
  it('reproduces R: quantile(1:4, c(0, .25, .5, .75, 1)) = 1, 1.75, 2.5, 3.25, 4 (from memory; hand-checked with h = 3p)', () => {
    expect([0, 0.25, 0.5, 0.75, 1].map((p) => quantileSorted([1, 2, 3, 4], p))).toEqual([1, 1.75, 2.5, 3.25, 4]);
  });

  it('interpolates between order statistics (hand-worked: [1, 3, 7, 15], median h = 1.5, 3 + 0.5 * 4 = 5)', () => {
    expect(quantileSorted([1, 3, 7, 15], 0.5)).toBe(5);
  });

  it('is NaN for an empty list and the value itself for one value', () => {
    expect(Number.isNaN(quantileSorted([], 0.5))).toBe(true);
    expect(quantileSorted([2], 0.9)).toBe(2);
  });
});
