import { describe, expect, it } from 'vitest';
import { opsPlus } from '../../src/stats/opsPlus.ts';

// Reference: common practice, OPS+ = 100 * (OBP/lgOBP + SLG/lgSLG - 1), without a park factor;
// values worked by hand.
describe('opsPlus(OBP, SLG, lgOBP, lgSLG)', () => {
  it('gives the doc example: 100 * (1.125 + 1.2 - 1) = 132.5', () => {
    expect(opsPlus(0.36, 0.48, 0.32, 0.4)).toBeCloseTo(132.5, 10);
  });
  it('is 100 for a league-average batter', () => {
    expect(opsPlus(0.317, 0.411, 0.317, 0.411)).toBeCloseTo(100, 10);
  });
  it('weighs OBP and SLG each against its own league value', () => {
    // OBP 10% below (0.9), SLG 20% above (1.2): 100 * (0.9 + 1.2 - 1) = 110 (by hand)
    expect(opsPlus(0.27, 0.48, 0.3, 0.4)).toBeCloseTo(110, 10);
  });
  it('returns NaN when a league value is 0', () => {
    expect(opsPlus(0.3, 0.4, 0, 0.4)).toBeNaN();
    expect(opsPlus(0.3, 0.4, 0.3, 0)).toBeNaN();
  });
});
