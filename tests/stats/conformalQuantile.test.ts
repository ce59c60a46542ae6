import { describe, expect, it } from 'vitest';
import { conformalIndex, conformalQuantile, rangeScore } from '../../src/stats/conformalQuantile.ts';

// Reference: Lei et al. (2018), split conformal: k = ceil((n + 1)(1 - alpha)); worked by hand.
describe('conformalIndex(n, alpha) and conformalQuantile(scores, alpha)', () => {
  it('takes the ceil((n + 1)(1 - alpha))-th smallest score', () => {
    expect(conformalIndex(19, 0.2)).toBe(16); // 20 * 0.8 = 16 exactly
    expect(conformalIndex(10, 0.2)).toBe(9); // 11 * 0.8 = 8.8 -> 9
    expect(conformalIndex(99, 0.1)).toBe(90);
    expect(conformalQuantile([5, 1, 4, 2, 3], 0.5)).toBe(3); // k = ceil(3) = 3
    expect(conformalQuantile([0.5, -1, 2, 0, 1, 3, -0.5, 4, 1.5, 2.5], 0.2)).toBe(3); // k = 9 of 10: sorted ... 2.5, 3, 4
  });

  it('is infinite when too few scores can back the coverage (k > n)', () => {
    expect(conformalIndex(3, 0.2)).toBe(4);
    expect(conformalQuantile([1, 2, 3], 0.2)).toBe(Infinity);
  });

  it('gives the stated coverage on exchangeable data: a range widened by q holds new cases at least 1 - alpha of the time', () => {
    // deterministic spread of scores: 0, 1, ..., 199 as calibration, the same values as test cases
    const cal = Array.from({ length: 199 }, (_, i) => (i * 37) % 199);
    const q = conformalQuantile(cal, 0.2);
    const test = Array.from({ length: 199 }, (_, i) => i);
    expect(test.filter((s) => s <= q).length / test.length).toBeGreaterThanOrEqual(0.8);
  });

  it('scores how far a value falls outside its range (negative inside)', () => {
    expect(rangeScore(5, 1, 4)).toBe(1);
    expect(rangeScore(0, 1, 4)).toBe(1);
    expect(rangeScore(2, 1, 4)).toBe(-1);
  });
});
