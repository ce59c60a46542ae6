import { describe, expect, it } from 'vitest';
import { leagueBattingRates } from '../../src/outlook/leagueBattingRates.ts';
import { bat } from './rosterLines.ts';

describe('leagueBattingRates(lines)', () => {
  it('gives the doc example: OBP 60 / 210, SLG 50 / 200', () => {
    const r = leagueBattingRates([bat('a', 2020, 'Top', { PA: 110, AB: 100, H: 30, BB: 10 }), bat('b', 2020, 'Top', { PA: 100, AB: 100, H: 20 })]);
    expect(r.OBP).toBeCloseTo(60 / 210, 12);
    expect(r.SLG).toBeCloseTo(50 / 200, 12);
    expect(r.PA).toBe(210);
  });
  it('is the rule 9.21 formulas applied to the summed counts, not the mean of the players\u2019 rates', () => {
    const a = bat('a', 2020, 'Top', { PA: 600, AB: 520, H: 150, doubles: 30, triples: 2, HR: 25, BB: 60, HBP: 10, SF: 10 });
    const b = bat('b', 2020, 'Top', { PA: 50, AB: 48, H: 5, HR: 0, BB: 2 });
    const r = leagueBattingRates([a, b]);
    // summed by hand: H 155, BB 62, HBP 10, AB 568, SF 10; TB = 155 + 30 + 4 + 75 = 264
    // OBP (155 + 62 + 10) / (568 + 62 + 10 + 10) = 227 / 650; SLG 264 / 568
    expect(r.OBP).toBeCloseTo(227 / 650, 12);
    expect(r.SLG).toBeCloseTo(264 / 568, 12);
    // the players' own: a 220 / 600, b 7 / 50
    const meanOfRates = (220 / 600 + 7 / 50) / 2;
    expect(Math.abs(r.OBP - meanOfRates)).toBeGreaterThan(0.01);
  });
  it('is NaN without an at-bat', () => {
    expect(leagueBattingRates([]).SLG).toBeNaN();
  });
});
