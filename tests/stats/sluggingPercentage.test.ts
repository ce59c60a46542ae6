import { describe, expect, it } from 'vitest';
import { sluggingPercentage } from '../../src/stats/sluggingPercentage.ts';
import { totalBases } from '../../src/stats/totalBases.ts';

// Reference: Official Baseball Rules definition of slugging percentage, TB / AB; values worked by hand.
describe('sluggingPercentage(TB, AB)', () => {
  it('gives the doc example: 246 total bases in 500 at-bats is .492', () => {
    expect(sluggingPercentage(246, 500)).toBeCloseTo(0.492, 12);
  });
  it('is four for a batter who homers in every at-bat', () => {
    expect(sluggingPercentage(totalBases(3, 0, 0, 3), 3)).toBe(4);
  });
  it('works from a hand-counted line: 1 single, 1 double in 4 AB is .750', () => {
    expect(sluggingPercentage(totalBases(2, 1, 0, 0), 4)).toBeCloseTo(0.75, 12);
  });
  it('returns NaN with no at-bats', () => {
    expect(sluggingPercentage(0, 0)).toBeNaN();
  });
});
