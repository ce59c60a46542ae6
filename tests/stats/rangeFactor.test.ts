import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { rangeFactor } from '../../src/stats/rangeFactor.ts';

// Reference: common practice, RF/9 = 9 * (PO + A) / innings, with innings = outs / 3; values worked by hand.
describe('rangeFactor: { PO, A, outs }', () => {
  it('gives the doc example: 620 plays over 1200 innings (3600 outs) is 4.65', () => {
    expect(rateOf(rangeFactor, { PO: 240, A: 380, outs: 3600 })).toBeCloseTo(4.65, 12);
  });
  it('reads innings as outs: 4 plays in one game of 9 innings (27 outs) is 4', () => {
    expect(rateOf(rangeFactor, { PO: 1, A: 3, outs: 27 })).toBeCloseTo(4, 12);
  });
  it('returns NaN with no innings in the field', () => {
    expect(rateOf(rangeFactor, { PO: 1, A: 1, outs: 0 })).toBeNaN();
  });
});
