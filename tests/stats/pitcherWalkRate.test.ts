import { describe, expect, it } from 'vitest';
import { pitcherWalkRate } from '../../src/stats/pitcherWalkRate.ts';

// Reference: common practice, walks per batter faced; values worked by hand.
describe('pitcherWalkRate(BB, BF)', () => {
  it('gives the doc example: pitcherWalkRate(60, 750) = 0.08', () => {
    expect(pitcherWalkRate(60, 750)).toBeCloseTo(0.08, 12);
  });
  it('divides the events by the opportunities: pitcherWalkRate(12, 300) = 0.04', () => {
    expect(pitcherWalkRate(12, 300)).toBeCloseTo(0.04, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(pitcherWalkRate(0, 0)).toBeNaN();
  });
});
