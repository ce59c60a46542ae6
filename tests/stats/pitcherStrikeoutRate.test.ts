import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { pitcherStrikeoutRate } from '../../src/stats/pitcherStrikeoutRate.ts';

// Reference: common practice, strikeouts per batter faced; values worked by hand.
describe('pitcherStrikeoutRate: { SO, BF }', () => {
  it('gives the doc example: rateOf(pitcherStrikeoutRate, { SO: 180, BF: 750 }) = 0.24', () => {
    expect(rateOf(pitcherStrikeoutRate, { SO: 180, BF: 750 })).toBeCloseTo(0.24, 12);
  });
  it('divides the events by the opportunities: rateOf(pitcherStrikeoutRate, { SO: 45, BF: 180 }) = 0.25', () => {
    expect(rateOf(pitcherStrikeoutRate, { SO: 45, BF: 180 })).toBeCloseTo(0.25, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(rateOf(pitcherStrikeoutRate, { SO: 0, BF: 0 })).toBeNaN();
  });
});
