import { describe, expect, it } from 'vitest';
import { onBasePercentage } from '../../src/stats/onBasePercentage.ts';

// Reference: Official Baseball Rules definition of on-base percentage, (H+BB+HBP)/(AB+BB+HBP+SF);
// values worked by hand.
describe('onBasePercentage(H, BB, HBP, AB, SF)', () => {
  it('gives the doc example: 215 times on base in 570 chances', () => {
    expect(onBasePercentage(150, 60, 5, 500, 5)).toBeCloseTo(215 / 570, 12);
  });
  it('counts sacrifice flies against the batter but not in the numerator', () => {
    // 2 H, 1 BB, 0 HBP in 4 AB + 1 SF: 3 / 6 = 0.5 (by hand)
    expect(onBasePercentage(2, 1, 0, 4, 1)).toBeCloseTo(0.5, 12);
    // the same line without the fly: 3 / 5 = 0.6
    expect(onBasePercentage(2, 1, 0, 4, 0)).toBeCloseTo(0.6, 12);
  });
  it('takes the arguments in the order H, BB, HBP, AB, SF', () => {
    // (10 + 3 + 1) / (40 + 3 + 1 + 2) = 14 / 46 (by hand); a swapped order would give another value
    expect(onBasePercentage(10, 3, 1, 40, 2)).toBeCloseTo(14 / 46, 12);
  });
  it('returns NaN with no plate appearances that count', () => {
    expect(onBasePercentage(0, 0, 0, 0, 0)).toBeNaN();
  });
});
