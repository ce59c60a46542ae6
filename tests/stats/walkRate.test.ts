import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { walkRate } from '../../src/stats/walkRate.ts';

// Reference: common practice, walks per plate appearance; values worked by hand.
describe('walkRate: { BB, PA }', () => {
  it('gives the doc example: rateOf(walkRate, { BB: 60, PA: 600 }) = 0.1', () => {
    expect(rateOf(walkRate, { BB: 60, PA: 600 })).toBeCloseTo(0.1, 12);
  });
  it('divides the events by the opportunities: rateOf(walkRate, { BB: 9, PA: 72 }) = 0.125', () => {
    expect(rateOf(walkRate, { BB: 9, PA: 72 })).toBeCloseTo(0.125, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(rateOf(walkRate, { BB: 0, PA: 0 })).toBeNaN();
  });
});
