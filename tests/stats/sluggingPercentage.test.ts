import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { sluggingPercentage } from '../../src/stats/sluggingPercentage.ts';

// Reference: Official Baseball Rules definition of slugging percentage, TB / AB; values worked by hand.
describe('sluggingPercentage: { H, doubles, triples, HR, AB }', () => {
  it('gives the doc example: 246 total bases in 500 at-bats is .492', () => {
    expect(rateOf(sluggingPercentage, { H: 150, doubles: 30, triples: 3, HR: 20, AB: 500 })).toBeCloseTo(0.492, 12);
  });
  it('is four for a batter who homers in every at-bat', () => {
    expect(rateOf(sluggingPercentage, { H: 3, doubles: 0, triples: 0, HR: 3, AB: 3 })).toBe(4);
  });
  it('works from a hand-counted line: 1 single, 1 double in 4 AB is .750', () => {
    expect(rateOf(sluggingPercentage, { H: 2, doubles: 1, triples: 0, HR: 0, AB: 4 })).toBeCloseTo(0.75, 12);
  });
  it('returns NaN with no at-bats', () => {
    expect(rateOf(sluggingPercentage, { H: 0, doubles: 0, triples: 0, HR: 0, AB: 0 })).toBeNaN();
  });
});
