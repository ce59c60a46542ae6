import { describe, expect, it } from 'vitest';
import { battingAverage } from '../../src/stats/battingAverage.ts';

// Reference: Official Baseball Rules definition of batting average, H / AB; values worked by hand.
describe('battingAverage(H, AB)', () => {
  it('gives the doc example: 150 hits in 500 at-bats is .300', () => {
    expect(battingAverage(150, 500)).toBeCloseTo(0.3, 12);
  });
  it('divides hits by at-bats: 1 for 3 is .333...', () => {
    expect(battingAverage(1, 3)).toBeCloseTo(1 / 3, 12);
    expect(battingAverage(173, 601)).toBeCloseTo(0.287853577, 9); // 173 / 601 by hand
  });
  it('returns NaN with no at-bats', () => {
    expect(battingAverage(0, 0)).toBeNaN();
  });
});
