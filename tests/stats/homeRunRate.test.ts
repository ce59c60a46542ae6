import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { homeRunRate } from '../../src/stats/homeRunRate.ts';

// Reference: common practice, home runs per plate appearance; values worked by hand.
describe('homeRunRate: { HR, PA }', () => {
  it('gives the doc example: rateOf(homeRunRate, { HR: 20, PA: 500 }) = 0.04', () => {
    expect(rateOf(homeRunRate, { HR: 20, PA: 500 })).toBeCloseTo(0.04, 12);
  });
  it('divides the events by the opportunities: rateOf(homeRunRate, { HR: 7, PA: 140 }) = 0.05', () => {
    expect(rateOf(homeRunRate, { HR: 7, PA: 140 })).toBeCloseTo(0.05, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(rateOf(homeRunRate, { HR: 0, PA: 0 })).toBeNaN();
  });
});
