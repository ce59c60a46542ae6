import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { fieldingPercentage } from '../../src/stats/fieldingPercentage.ts';

// Reference: Official Baseball Rules definition of fielding average, (PO + A) / (PO + A + E);
// values worked by hand.
describe('fieldingPercentage: { PO, A, E }', () => {
  it('gives the doc example: 620 of 640 chances is .96875', () => {
    expect(rateOf(fieldingPercentage, { PO: 240, A: 380, E: 20 })).toBeCloseTo(0.96875, 12);
  });
  it('counts errors only in the denominator: 9 plays and 1 error is .900', () => {
    expect(rateOf(fieldingPercentage, { PO: 4, A: 5, E: 1 })).toBeCloseTo(0.9, 12);
  });
  it('returns NaN with no chances', () => {
    expect(rateOf(fieldingPercentage, { PO: 0, A: 0, E: 0 })).toBeNaN();
  });
});
