import { describe, expect, it } from 'vitest';
import { brierScore } from '../../src/stats/brierScore.ts';

// Reference: Brier (1950), BS = mean (f - o)^2; values worked by hand.
describe('brierScore(forecasts, outcomes)', () => {
  it('gives the doc example: (0.01 + 0.04 + 0.25) / 3 = 0.1', () => {
    expect(brierScore([0.9, 0.2, 0.5], [true, false, false])).toBeCloseTo(0.1, 12);
  });
  it('is 0 for certain, correct forecasts and 1 for certain, wrong ones', () => {
    expect(brierScore([1, 0], [true, false])).toBe(0);
    expect(brierScore([0, 1], [true, false])).toBe(1);
  });
  it('scores a constant forecast of the observed frequency p at p (1 - p), the uncertainty term of Murphy (1973)', () => {
    // 3 of 10 happened: forecasting 0.3 every time scores 0.3 * 0.7 = 0.21
    const outcomes = [true, false, false, true, false, false, false, true, false, false];
    expect(brierScore(outcomes.map(() => 0.3), outcomes)).toBeCloseTo(0.21, 12);
  });
  it('leaves out NaN forecasts and returns NaN when none is left', () => {
    expect(brierScore([NaN, 1], [false, true])).toBe(0);
    expect(brierScore([NaN], [true])).toBeNaN();
  });
});
