import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { strikeoutRate } from '../../src/stats/strikeoutRate.ts';

// Reference: common practice, strikeouts per plate appearance; values worked by hand.
describe('strikeoutRate: { SO, PA }', () => {
  it('gives the doc example: rateOf(strikeoutRate, { SO: 100, PA: 570 }) = 100 / 570', () => {
    expect(rateOf(strikeoutRate, { SO: 100, PA: 570 })).toBeCloseTo(100 / 570, 12);
  });
  it('divides the events by the opportunities: rateOf(strikeoutRate, { SO: 27, PA: 108 }) = 0.25', () => {
    expect(rateOf(strikeoutRate, { SO: 27, PA: 108 })).toBeCloseTo(0.25, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(rateOf(strikeoutRate, { SO: 0, PA: 0 })).toBeNaN();
  });
});
