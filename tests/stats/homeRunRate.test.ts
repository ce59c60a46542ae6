import { describe, expect, it } from 'vitest';
import { homeRunRate } from '../../src/stats/homeRunRate.ts';

// Reference: common practice, home runs per plate appearance; values worked by hand.
describe('homeRunRate(HR, PA)', () => {
  it('gives the doc example: homeRunRate(20, 500) = 0.04', () => {
    expect(homeRunRate(20, 500)).toBeCloseTo(0.04, 12);
  });
  it('divides the events by the opportunities: homeRunRate(7, 140) = 0.05', () => {
    expect(homeRunRate(7, 140)).toBeCloseTo(0.05, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(homeRunRate(0, 0)).toBeNaN();
  });
});
