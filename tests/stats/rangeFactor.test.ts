import { describe, expect, it } from 'vitest';
import { rangeFactor } from '../../src/stats/rangeFactor.ts';

// Reference: common practice, RF/9 = 9 * (PO + A) / innings, with innings = outs / 3; values worked by hand.
describe('rangeFactor(PO, A, outs)', () => {
  it('gives the doc example: 620 plays over 1200 innings (3600 outs) is 4.65', () => {
    expect(rangeFactor(240, 380, 3600)).toBeCloseTo(4.65, 12);
  });
  it('reads innings as outs: 4 plays in one game of 9 innings (27 outs) is 4', () => {
    expect(rangeFactor(1, 3, 27)).toBeCloseTo(4, 12);
  });
  it('returns NaN with no innings in the field', () => {
    expect(rangeFactor(1, 1, 0)).toBeNaN();
  });
});
