import { describe, expect, it } from 'vitest';
import { nearestRankQuantile, quantileSorted } from '../../src/stats/quantile.ts';

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

// Reference: Hyndman and Fan (1996), definition 1 (nearest rank, R's quantile(type = 1)); worked by hand.
describe('nearestRankQuantile(sorted, p)', () => {
  it('gives the doc examples: the median of 1..4 is the 2nd value, the 99th percentile the 4th', () => {
    expect(nearestRankQuantile([1, 2, 3, 4], 0.5)).toBe(2);
    expect(nearestRankQuantile([1, 2, 3, 4], 0.99)).toBe(4);
  });
  it('takes the first value at p = 0 and is NaN for an empty list', () => {
    expect(nearestRankQuantile([5, 6], 0)).toBe(5);
    expect(nearestRankQuantile([], 0.5)).toBeNaN();
  });
});
