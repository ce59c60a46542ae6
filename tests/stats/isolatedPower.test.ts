import { describe, expect, it } from 'vitest';
import { battingAverage } from '../../src/stats/battingAverage.ts';
import { isolatedPower } from '../../src/stats/isolatedPower.ts';
import { sluggingPercentage } from '../../src/stats/sluggingPercentage.ts';

// Reference: common practice, ISO = SLG - AVG = (TB - H) / AB; values worked by hand.
describe('isolatedPower(TB, H, AB)', () => {
  it('gives the doc example: (246 - 150) / 500 = .192', () => {
    expect(isolatedPower(246, 150, 500)).toBeCloseTo(0.192, 12);
  });
  it('equals SLG minus AVG', () => {
    const [TB, H, AB] = [301, 171, 588];
    expect(isolatedPower(TB, H, AB)).toBeCloseTo(sluggingPercentage(TB, AB) - battingAverage(H, AB), 12);
  });
  it('is zero for a singles-only hitter', () => {
    expect(isolatedPower(40, 40, 150)).toBe(0);
  });
  it('returns NaN with no at-bats', () => {
    expect(isolatedPower(0, 0, 0)).toBeNaN();
  });
});
