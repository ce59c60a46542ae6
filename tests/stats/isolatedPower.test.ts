import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { isolatedPower } from '../../src/stats/isolatedPower.ts';

// Reference: common practice, ISO = SLG - AVG = (TB - H) / AB; values worked by hand.
describe('isolatedPower: { H, doubles, triples, HR, AB }', () => {
  it('gives the doc example: (246 - 150) / 500 = .192', () => {
    expect(rateOf(isolatedPower, { H: 150, doubles: 30, triples: 3, HR: 20, AB: 500 })).toBeCloseTo(0.192, 12);
  });
  it('equals SLG minus AVG: 171 H with 30 2B, 4 3B, 22 HR in 588 AB', () => {
    // TB = 171 + 30 + 8 + 66 = 275; SLG 275 / 588, AVG 171 / 588, ISO 104 / 588 (by hand)
    expect(rateOf(isolatedPower, { H: 171, doubles: 30, triples: 4, HR: 22, AB: 588 })).toBeCloseTo(104 / 588, 12);
  });
  it('is zero for a singles-only hitter', () => {
    expect(rateOf(isolatedPower, { H: 40, doubles: 0, triples: 0, HR: 0, AB: 150 })).toBe(0);
  });
  it('returns NaN with no at-bats', () => {
    expect(rateOf(isolatedPower, { H: 0, doubles: 0, triples: 0, HR: 0, AB: 0 })).toBeNaN();
  });
});
