import { describe, expect, it } from 'vitest';
import { intervalCoverage } from '../../src/stats/intervalCoverage.ts';

describe('intervalCoverage(truth, low, high)', () => {
  it('gives the doc example: 2 of 3 inside', () => {
    expect(intervalCoverage([1, 5, 9], [0, 6, 8], [2, 8, 9])).toBeCloseTo(2 / 3, 12);
  });
  it('counts the ends as inside', () => {
    expect(intervalCoverage([2, 8], [2, 1], [3, 8])).toBe(1);
  });
  it('leaves out NaN and returns NaN when nothing is left', () => {
    expect(intervalCoverage([NaN, 1], [0, 0], [1, 0.5])).toBe(0);
    expect(intervalCoverage([1], [NaN], [2])).toBeNaN();
  });
});
