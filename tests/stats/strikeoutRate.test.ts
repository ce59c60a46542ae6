import { describe, expect, it } from 'vitest';
import { strikeoutRate } from '../../src/stats/strikeoutRate.ts';

// Reference: common practice, strikeouts per plate appearance; values worked by hand.
describe('strikeoutRate(SO, PA)', () => {
  it('gives the doc example: strikeoutRate(100, 570) = 100 / 570', () => {
    expect(strikeoutRate(100, 570)).toBeCloseTo(100 / 570, 12);
  });
  it('divides the events by the opportunities: strikeoutRate(27, 108) = 0.25', () => {
    expect(strikeoutRate(27, 108)).toBeCloseTo(0.25, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(strikeoutRate(0, 0)).toBeNaN();
  });
});
