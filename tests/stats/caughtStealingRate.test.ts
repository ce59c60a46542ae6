import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { caughtStealingRate } from '../../src/stats/caughtStealingRate.ts';

// Reference: common practice, CS% = CS / (SB + CS), attempts counted as SB allowed + CS; values worked by hand.
describe('caughtStealingRate: { csCaught, sbAgainst }', () => {
  it('gives the doc example: 15 caught of 60 attempts is .250', () => {
    expect(rateOf(caughtStealingRate, { csCaught: 15, sbAgainst: 60 })).toBeCloseTo(0.25, 12);
  });
  it('divides runners caught by attempts: 3 caught of 4 is .750', () => {
    expect(rateOf(caughtStealingRate, { csCaught: 3, sbAgainst: 4 })).toBeCloseTo(0.75, 12);
  });
  it('returns NaN with no attempts', () => {
    expect(rateOf(caughtStealingRate, { csCaught: 0, sbAgainst: 0 })).toBeNaN();
  });
});
