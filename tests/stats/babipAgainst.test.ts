import { describe, expect, it } from 'vitest';
import { babip } from '../../src/stats/babip.ts';
import { babipAgainst } from '../../src/stats/babipAgainst.ts';

// Reference: common practice approximation, (H - HR) / (BF - SO - BB - HBP - HR); values worked by hand.
describe('babipAgainst(H, HR, BF, SO, BB, HBP)', () => {
  it('gives the doc example: 130 / 495', () => {
    expect(babipAgainst(150, 20, 750, 180, 50, 5)).toBeCloseTo(130 / 495, 12);
  });
  it('matches the batting form when the only other plate appearances are sacrifice flies', () => {
    // 40 AB + 4 BB + 1 HBP + 2 SF = 47 BF; 12 H, 2 HR, 9 SO
    expect(babipAgainst(12, 2, 47, 9, 4, 1)).toBeCloseTo(babip(12, 2, 40, 9, 2), 12);
  });
  it('returns NaN when nothing was put in play', () => {
    expect(babipAgainst(0, 0, 3, 3, 0, 0)).toBeNaN();
  });
});
