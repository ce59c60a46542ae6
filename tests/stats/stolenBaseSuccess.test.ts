import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { stolenBaseSuccess } from '../../src/stats/stolenBaseSuccess.ts';

// Reference: common practice, SB% = SB / (SB + CS); values worked by hand.
describe('stolenBaseSuccess: { SB, CS }', () => {
  it('gives the doc example: 30 of 40 attempts is .750', () => {
    expect(rateOf(stolenBaseSuccess, { SB: 30, CS: 10 })).toBeCloseTo(0.75, 12);
  });
  it('takes SB first: 1 steal, 4 caught is .200', () => {
    expect(rateOf(stolenBaseSuccess, { SB: 1, CS: 4 })).toBeCloseTo(0.2, 12);
  });
  it('returns NaN with no attempts', () => {
    expect(rateOf(stolenBaseSuccess, { SB: 0, CS: 0 })).toBeNaN();
  });
});
