import { describe, expect, it } from 'vitest';
import { pitcherStrikeoutRate } from '../../src/stats/pitcherStrikeoutRate.ts';

// Reference: common practice, strikeouts per batter faced; values worked by hand.
describe('pitcherStrikeoutRate(SO, BF)', () => {
  it('gives the doc example: pitcherStrikeoutRate(180, 750) = 0.24', () => {
    expect(pitcherStrikeoutRate(180, 750)).toBeCloseTo(0.24, 12);
  });
  it('divides the events by the opportunities: pitcherStrikeoutRate(45, 180) = 0.25', () => {
    expect(pitcherStrikeoutRate(45, 180)).toBeCloseTo(0.25, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(pitcherStrikeoutRate(0, 0)).toBeNaN();
  });
});
