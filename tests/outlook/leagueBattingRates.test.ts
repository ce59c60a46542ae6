import { describe, expect, it } from 'vitest';
import { leagueBattingRates } from '../../src/outlook/leagueBattingRates.ts';
import { onBasePercentage } from '../../src/stats/onBasePercentage.ts';
import { sluggingPercentage } from '../../src/stats/sluggingPercentage.ts';
import { bat } from './rosterLines.ts';

describe('leagueBattingRates(lines)', () => {
  it('gives the doc example: OBP 60 / 210, SLG 50 / 200', () => {
    const r = leagueBattingRates([bat('a', 2020, 'MLB', { PA: 110, AB: 100, H: 30, BB: 10 }), bat('b', 2020, 'MLB', { PA: 100, AB: 100, H: 20 })]);
    expect(r.OBP).toBeCloseTo(60 / 210, 12);
    expect(r.SLG).toBeCloseTo(50 / 200, 12);
    expect(r.PA).toBe(210);
  });
  it('is the rule 9.21 formulas applied to the summed counts, not the mean of the players\u2019 rates', () => {
    const a = bat('a', 2020, 'MLB', { PA: 600, AB: 520, H: 150, doubles: 30, triples: 2, HR: 25, BB: 60, HBP: 10, SF: 10 });
    const b = bat('b', 2020, 'MLB', { PA: 50, AB: 48, H: 5, HR: 0, BB: 2 });
    const r = leagueBattingRates([a, b]);
    // summed by hand: H 155, BB 62, HBP 10, AB 568, SF 10; TB = 155 + 30 + 4 + 75 = 264
    expect(r.OBP).toBeCloseTo(onBasePercentage(155, 62, 10, 568, 10), 12);
    expect(r.SLG).toBeCloseTo(sluggingPercentage(264, 568), 12);
    const meanOfRates = (onBasePercentage(150, 60, 10, 520, 10) + onBasePercentage(5, 2, 0, 48, 0)) / 2;
    expect(Math.abs(r.OBP - meanOfRates)).toBeGreaterThan(0.01);
  });
  it('is NaN without an at-bat', () => {
    expect(leagueBattingRates([]).SLG).toBeNaN();
  });
});
