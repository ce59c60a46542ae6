import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { pitcherHomeRunRate } from '../../src/stats/pitcherHomeRunRate.ts';

// Reference: common practice, home runs per batter faced; values worked by hand.
describe('pitcherHomeRunRate: { HR, BF }', () => {
  it('gives the doc example: rateOf(pitcherHomeRunRate, { HR: 15, BF: 750 }) = 0.02', () => {
    expect(rateOf(pitcherHomeRunRate, { HR: 15, BF: 750 })).toBeCloseTo(0.02, 12);
  });
  it('divides the events by the opportunities: rateOf(pitcherHomeRunRate, { HR: 3, BF: 400 }) = 0.0075', () => {
    expect(rateOf(pitcherHomeRunRate, { HR: 3, BF: 400 })).toBeCloseTo(0.0075, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(rateOf(pitcherHomeRunRate, { HR: 0, BF: 0 })).toBeNaN();
  });
});
