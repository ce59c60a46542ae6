import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { babip } from '../../src/stats/babip.ts';
import { babipAgainst } from '../../src/stats/babipAgainst.ts';

// Reference: common practice approximation, (H - HR) / (BF - SO - BB - HBP - HR); values worked by hand.
describe('babipAgainst: { H, HR, BF, SO, BB, HBP }', () => {
  it('gives the doc example: 130 / 495', () => {
    expect(rateOf(babipAgainst, { H: 150, HR: 20, BF: 750, SO: 180, BB: 50, HBP: 5 })).toBeCloseTo(130 / 495, 12);
  });
  it('matches the batting form when the only other plate appearances are sacrifice flies', () => {
    // 40 AB + 4 BB + 1 HBP + 2 SF = 47 BF; 12 H, 2 HR, 9 SO
    expect(rateOf(babipAgainst, { H: 12, HR: 2, BF: 47, SO: 9, BB: 4, HBP: 1 })).toBeCloseTo(rateOf(babip, { H: 12, HR: 2, AB: 40, SO: 9, SF: 2 }), 12);
  });
  it('returns NaN when nothing was put in play', () => {
    expect(rateOf(babipAgainst, { H: 0, HR: 0, BF: 3, SO: 3, BB: 0, HBP: 0 })).toBeNaN();
  });
});
