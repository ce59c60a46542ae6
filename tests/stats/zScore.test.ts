import { describe, expect, it } from 'vitest';
import { zScore } from '../../src/stats/zScore.ts';

// Reference: common practice, z = (x - mean) / sd; values worked by hand.
describe('zScore(x, mean, sd)', () => {
  it('gives the doc example: 95 against mean 88, sd 3.5 is 2', () => {
    expect(zScore(95, 88, 3.5)).toBeCloseTo(2, 12);
  });
  it('is negative below the mean: 0.250 against 0.300, sd 0.025 is -2', () => {
    expect(zScore(0.25, 0.3, 0.025)).toBeCloseTo(-2, 12);
  });
  it('returns NaN when sd is 0 or x is missing', () => {
    expect(zScore(1, 1, 0)).toBeNaN();
    expect(zScore(NaN, 1, 1)).toBeNaN();
  });
});
