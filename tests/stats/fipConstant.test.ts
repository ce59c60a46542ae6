import { describe, expect, it } from 'vitest';
import { era } from '../../src/stats/era.ts';
import { fip } from '../../src/stats/fip.ts';
import { fipConstant } from '../../src/stats/fipConstant.ts';

// Reference: common practice (from memory), C = lgERA - (13 lgHR + 3 (lgBB + lgHBP) - 2 lgSO) / lgIP,
// defined so that the league's FIP equals its ERA; values worked by hand.
describe('fipConstant(lgERA, lgHR, lgBB, lgHBP, lgSO, lgOuts)', () => {
  it('gives the doc example: 4 - 7500 / 14400', () => {
    expect(fipConstant(4, 1000, 3000, 500, 8000, 43200)).toBeCloseTo(4 - 7500 / 14400, 12);
  });
  it('makes the league FIP equal the league ERA', () => {
    const lg = { ER: 6150, HR: 1430, BB: 4820, HBP: 560, SO: 12900, outs: 40500 };
    const lgERA = era(lg.ER, lg.outs);
    const C = fipConstant(lgERA, lg.HR, lg.BB, lg.HBP, lg.SO, lg.outs);
    expect(fip(lg.HR, lg.BB, lg.HBP, lg.SO, lg.outs, C)).toBeCloseTo(lgERA, 10);
  });
  it('returns NaN with no league outs', () => {
    expect(fipConstant(4, 0, 0, 0, 0, 0)).toBeNaN();
  });
});
