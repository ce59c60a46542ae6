import { describe, expect, it } from 'vitest';
import { fipConstant } from '../../src/stats/fipConstant.ts';

// Reference: common practice (from memory), C = lgERA - (13 lgHR + 3 (lgBB + lgHBP) - 2 lgSO) / lgIP,
// defined so that the league's FIP equals its ERA; values worked by hand.
describe('fipConstant({ ER, HR, BB, HBP, SO, outs })', () => {
  it('gives the doc example: lgERA 3, C = 3 - 7500 / 14400', () => {
    expect(fipConstant({ ER: 4800, HR: 1000, BB: 3000, HBP: 500, SO: 8000, outs: 43200 })).toBeCloseTo(3 - 7500 / 14400, 12);
  });
  it('works a small league by hand: 105 ER in 720 outs, 28 HR, 75 BB, 8 HBP, 230 SO is C = 3.3', () => {
    // lgERA = 9 * 105 / 240 = 3.9375; raw FIP = (364 + 249 - 460) / 240 = 0.6375
    expect(fipConstant({ ER: 105, HR: 28, BB: 75, HBP: 8, SO: 230, outs: 720 })).toBeCloseTo(3.3, 12);
  });
  it('returns NaN with no league outs', () => {
    expect(fipConstant({ ER: 0, HR: 0, BB: 0, HBP: 0, SO: 0, outs: 0 })).toBeNaN();
  });
});
