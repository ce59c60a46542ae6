import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { pitcherWalkRate } from '../../src/stats/pitcherWalkRate.ts';

// Reference: common practice, walks per batter faced; values worked by hand.
describe('pitcherWalkRate: { BB, BF }', () => {
  it('gives the doc example: rateOf(pitcherWalkRate, { BB: 60, BF: 750 }) = 0.08', () => {
    expect(rateOf(pitcherWalkRate, { BB: 60, BF: 750 })).toBeCloseTo(0.08, 12);
  });
  it('divides the events by the opportunities: rateOf(pitcherWalkRate, { BB: 12, BF: 300 }) = 0.04', () => {
    expect(rateOf(pitcherWalkRate, { BB: 12, BF: 300 })).toBeCloseTo(0.04, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(rateOf(pitcherWalkRate, { BB: 0, BF: 0 })).toBeNaN();
  });
});
