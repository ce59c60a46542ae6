import { describe, expect, it } from 'vitest';
import { fieldingPercentage } from '../../src/stats/fieldingPercentage.ts';

// Reference: Official Baseball Rules definition of fielding average, (PO + A) / (PO + A + E);
// values worked by hand.
describe('fieldingPercentage(PO, A, E)', () => {
  it('gives the doc example: 620 of 640 chances is .96875', () => {
    expect(fieldingPercentage(240, 380, 20)).toBeCloseTo(0.96875, 12);
  });
  it('counts errors only in the denominator: 9 plays and 1 error is .900', () => {
    expect(fieldingPercentage(4, 5, 1)).toBeCloseTo(0.9, 12);
  });
  it('returns NaN with no chances', () => {
    expect(fieldingPercentage(0, 0, 0)).toBeNaN();
  });
});
