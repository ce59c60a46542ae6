import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { onBasePercentage } from '../../src/stats/onBasePercentage.ts';

// Reference: Official Baseball Rules definition of on-base percentage, (H+BB+HBP)/(AB+BB+HBP+SF);
// values worked by hand.
describe('onBasePercentage: { H, BB, HBP, AB, SF }', () => {
  it('gives the doc example: 215 times on base in 570 chances', () => {
    expect(rateOf(onBasePercentage, { H: 150, BB: 60, HBP: 5, AB: 500, SF: 5 })).toBeCloseTo(215 / 570, 12);
  });
  it('counts sacrifice flies against the batter but not in the numerator', () => {
    // 2 H, 1 BB, 0 HBP in 4 AB + 1 SF: 3 / 6 = 0.5 (by hand)
    expect(rateOf(onBasePercentage, { H: 2, BB: 1, HBP: 0, AB: 4, SF: 1 })).toBeCloseTo(0.5, 12);
    // the same line without the fly: 3 / 5 = 0.6
    expect(rateOf(onBasePercentage, { H: 2, BB: 1, HBP: 0, AB: 4, SF: 0 })).toBeCloseTo(0.6, 12);
  });
  it('takes the arguments in the order H, BB, HBP, AB, SF', () => {
    // (10 + 3 + 1) / (40 + 3 + 1 + 2) = 14 / 46 (by hand); a swapped order would give another value
    expect(rateOf(onBasePercentage, { H: 10, BB: 3, HBP: 1, AB: 40, SF: 2 })).toBeCloseTo(14 / 46, 12);
  });
  it('returns NaN with no plate appearances that count', () => {
    expect(rateOf(onBasePercentage, { H: 0, BB: 0, HBP: 0, AB: 0, SF: 0 })).toBeNaN();
  });
});
