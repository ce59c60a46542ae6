import { describe, expect, it } from 'vitest';
import { fipMinus } from '../../src/stats/fipMinus.ts';

// Reference: common practice, FIP- = 100 * FIP / lgFIP, without a park factor; values worked by hand.
describe('fipMinus(FIP, lgFIP)', () => {
  it('gives the doc example: 3.60 against a 4.00 league is 90', () => {
    expect(fipMinus(3.6, 4)).toBeCloseTo(90, 10);
  });
  it('is 100 at league average and above 100 when worse', () => {
    expect(fipMinus(4.12, 4.12)).toBeCloseTo(100, 10);
    expect(fipMinus(5, 4)).toBeCloseTo(125, 10);
  });
  it('returns NaN when the league FIP is 0', () => {
    expect(fipMinus(3, 0)).toBeNaN();
  });
});
