import { describe, expect, it } from 'vitest';
import { leagueFip } from '../../src/stats/leagueFip.ts';
import { pitch } from '../outlook/rosterLines.ts';

describe('leagueFip(lines)', () => {
  it('gives the doc example: lgERA 4, C = 4 - 155 / 180, lgFIP = lgERA', () => {
    const r = leagueFip([pitch('a', 2020, 'Top', { outs: 540, BF: 800, ER: 80, HR: 20, BB: 60, HBP: 5, SO: 150 })]);
    expect(r.ERA).toBeCloseTo(4, 12);
    expect(r.constant).toBeCloseTo(4 - 155 / 180, 12);
    expect(r.FIP).toBeCloseTo(4, 12);
  });
  it('sums the lines before applying src/stats/fipConstant.ts (not the mean of per-pitcher constants), so the league FIP equals the league ERA', () => {
    const lines = [
      pitch('a', 2020, 'Top', { outs: 600, BF: 850, ER: 70, HR: 18, BB: 50, HBP: 6, SO: 210 }),
      pitch('b', 2020, 'Top', { outs: 150, BF: 230, ER: 30, HR: 9, BB: 25, HBP: 2, SO: 30 }),
    ];
    const r = leagueFip(lines);
    // summed by hand: ER 100, outs 750, HR 27, BB 75, HBP 8, SO 240
    // lgERA = 27 * 100 / 750 = 3.6; C = 3.6 - (351 + 249 - 480) / 250 = 3.6 - 0.48 = 3.12
    const era = (27 * 100) / 750;
    expect(r.constant).toBeCloseTo(3.12, 12);
    expect(r.FIP).toBeCloseTo(era, 12);
  });
  it('is NaN without an out', () => {
    expect(leagueFip([]).FIP).toBeNaN();
  });
});
