import { describe, expect, it } from 'vitest';
import { averageRanks } from '../../src/stats/averageRanks.ts';

// Reference: fractional ranking (Wikipedia, "Ranking"): ties share the mean of the ranks they span.
describe('averageRanks(values)', () => {
  it('gives the doc example: [10, 20, 20, 30] => [1, 2.5, 2.5, 4]', () => {
    expect(averageRanks([10, 20, 20, 30])).toEqual([1, 2.5, 2.5, 4]);
  });
  it('ranks in input order whatever the order of the values', () => {
    expect(averageRanks([3, 1, 2])).toEqual([3, 1, 2]);
  });
  it('gives three tied values the middle rank and keeps the rank sum n (n + 1) / 2', () => {
    const r = averageRanks([5, 5, 5, 1, 9]);
    expect(r).toEqual([3, 3, 3, 1, 5]);
    expect(r.reduce((a, b) => a + b, 0)).toBe(15);
  });
});
