import { describe, expect, it } from 'vitest';
import { regressAverageToMean } from '../../src/stats/regressAverageToMean.ts';
import { regressToMean } from '../../src/stats/regressToMean.ts';

// Reference: common practice shrinkage for a mean, (mean * n + leagueMean * k) / (n + k); values worked by hand.
describe('regressAverageToMean(mean, n, leagueMean, k)', () => {
  it('gives the doc example: 92 mph over 30 BBE, league 88, k 50 -> 89.5', () => {
    expect(regressAverageToMean(92, 30, 88, 50)).toBeCloseTo(89.5, 12);
  });
  it('weights by sample size: 100 measurements against k 25 keep 80% of the gap', () => {
    // (90 * 100 + 85 * 25) / 125 = (9000 + 2125) / 125 = 89 (by hand)
    expect(regressAverageToMean(90, 100, 85, 25)).toBeCloseTo(89, 12);
  });
  it('agrees with the rate form when the mean is a rate', () => {
    expect(regressAverageToMean(30 / 100, 100, 0.2, 60)).toBeCloseTo(regressToMean(30, 100, 0.2, 60), 12);
  });
  it('returns NaN when n + k is 0', () => {
    expect(regressAverageToMean(90, 0, 88, 0)).toBeNaN();
  });
});
