import { describe, expect, it } from 'vitest';
import { pitcherHomeRunRate } from '../../src/stats/pitcherHomeRunRate.ts';

// Reference: common practice, home runs per batter faced; values worked by hand.
describe('pitcherHomeRunRate(HR, BF)', () => {
  it('gives the doc example: pitcherHomeRunRate(15, 750) = 0.02', () => {
    expect(pitcherHomeRunRate(15, 750)).toBeCloseTo(0.02, 12);
  });
  it('divides the events by the opportunities: pitcherHomeRunRate(3, 400) = 0.0075', () => {
    expect(pitcherHomeRunRate(3, 400)).toBeCloseTo(0.0075, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(pitcherHomeRunRate(0, 0)).toBeNaN();
  });
});
