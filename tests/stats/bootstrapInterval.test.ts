import { describe, expect, it } from 'vitest';
import { bootstrapInterval } from '../../src/stats/bootstrapInterval.ts';

// Reference: Efron and Tibshirani (1993): the percentile interval of the mean of n cases from a
// distribution of sd s is close to mean +/- 1.96 s / sqrt(n) (normal approximation).
describe('bootstrapInterval(n, statistic)', () => {
  it('brackets the mean of 0..99 about +/- 1.96 sd / sqrt(n)', () => {
    const xs = Array.from({ length: 100 }, (_, i) => i);
    const mean = (idx: readonly number[]): number => idx.reduce((a, i) => a + (xs[i] as number), 0) / idx.length;
    const [lo, hi] = bootstrapInterval(100, mean, { rounds: 2000, seed: 3 });
    const half = (1.96 * Math.sqrt(((100 * 100 - 1) / 12))) / 10; // sd of 0..99 is sqrt((n^2 - 1) / 12)
    expect(lo).toBeGreaterThan(49.5 - 1.25 * half);
    expect(lo).toBeLessThan(49.5 - 0.75 * half);
    expect(hi).toBeGreaterThan(49.5 + 0.75 * half);
    expect(hi).toBeLessThan(49.5 + 1.25 * half);
  });
});
