import { describe, expect, it } from 'vitest';
import { regressToMean } from '../../src/stats/regressToMean.ts';

// Reference: common practice shrinkage, (successes + k * leagueRate) / (trials + k); values worked by hand.
describe('regressToMean(successes, trials, leagueRate, k)', () => {
  it('gives the doc example: 30 SO in 100 PA, league .200, k 60 -> 42 / 160 = .2625', () => {
    expect(regressToMean(30, 100, 0.2, 60)).toBeCloseTo(0.2625, 12);
  });
  it('lands halfway between observed and league when trials equal k', () => {
    // observed 0.30 over 120 trials, league 0.10, k 120: (36 + 12) / 240 = 0.20 (by hand)
    expect(regressToMean(36, 120, 0.1, 120)).toBeCloseTo(0.2, 12);
  });
  it('returns the league rate with no trials and the observed rate with k = 0', () => {
    expect(regressToMean(0, 0, 0.08, 170)).toBeCloseTo(0.08, 12);
    expect(regressToMean(7, 20, 0.08, 0)).toBeCloseTo(0.35, 12);
  });
  it('returns NaN when trials + k is 0', () => {
    expect(regressToMean(0, 0, 0.2, 0)).toBeNaN();
  });
});
