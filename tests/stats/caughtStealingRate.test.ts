import { describe, expect, it } from 'vitest';
import { caughtStealingRate } from '../../src/stats/caughtStealingRate.ts';

// Reference: common practice, CS% = CS / (SB + CS); values worked by hand.
describe('caughtStealingRate(CS, SB)', () => {
  it('gives the doc example: 15 caught of 60 attempts is .250', () => {
    expect(caughtStealingRate(15, 45)).toBeCloseTo(0.25, 12);
  });
  it('takes runners caught first: 3 caught, 1 safe is .750', () => {
    expect(caughtStealingRate(3, 1)).toBeCloseTo(0.75, 12);
  });
  it('returns NaN with no attempts', () => {
    expect(caughtStealingRate(0, 0)).toBeNaN();
  });
});
