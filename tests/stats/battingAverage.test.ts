import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { battingAverage } from '../../src/stats/battingAverage.ts';

// Reference: Official Baseball Rules definition of batting average, H / AB; values worked by hand.
describe('battingAverage: { H, AB }', () => {
  it('gives the doc example: 150 hits in 500 at-bats is .300', () => {
    expect(rateOf(battingAverage, { H: 150, AB: 500 })).toBeCloseTo(0.3, 12);
  });
  it('divides hits by at-bats: 1 for 3 is .333...', () => {
    expect(rateOf(battingAverage, { H: 1, AB: 3 })).toBeCloseTo(1 / 3, 12);
    expect(rateOf(battingAverage, { H: 173, AB: 601 })).toBeCloseTo(0.287853577, 9); // 173 / 601 by hand
  });
  it('returns NaN with no at-bats', () => {
    expect(rateOf(battingAverage, { H: 0, AB: 0 })).toBeNaN();
  });
});
