import { describe, expect, it } from 'vitest';
import { babip } from '../../src/stats/babip.ts';

// Reference: common practice, BABIP = (H - HR) / (AB - SO - HR + SF); values worked by hand.
describe('babip(H, HR, AB, SO, SF)', () => {
  it('gives the doc example: 130 / 385', () => {
    expect(babip(150, 20, 500, 100, 5)).toBeCloseTo(130 / 385, 12);
  });
  it('leaves home runs and strikeouts out of balls in play', () => {
    // 10 AB: 3 SO, 1 HR, 2 other hits, 4 outs in play; 0 SF -> 2 / 6 (by hand)
    expect(babip(3, 1, 10, 3, 0)).toBeCloseTo(2 / 6, 12);
  });
  it('returns NaN when nothing was put in play', () => {
    expect(babip(1, 1, 4, 3, 0)).toBeNaN(); // 4 AB = 3 SO + 1 HR
  });
});
