import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { babip } from '../../src/stats/babip.ts';

// Reference: common practice, BABIP = (H - HR) / (AB - SO - HR + SF); values worked by hand.
describe('babip: { H, HR, AB, SO, SF }', () => {
  it('gives the doc example: 130 / 385', () => {
    expect(rateOf(babip, { H: 150, HR: 20, AB: 500, SO: 100, SF: 5 })).toBeCloseTo(130 / 385, 12);
  });
  it('leaves home runs and strikeouts out of balls in play', () => {
    // 10 AB: 3 SO, 1 HR, 2 other hits, 4 outs in play; 0 SF -> 2 / 6 (by hand)
    expect(rateOf(babip, { H: 3, HR: 1, AB: 10, SO: 3, SF: 0 })).toBeCloseTo(2 / 6, 12);
  });
  it('returns NaN when nothing was put in play', () => {
    expect(rateOf(babip, { H: 1, HR: 1, AB: 4, SO: 3, SF: 0 })).toBeNaN(); // 4 AB = 3 SO + 1 HR
  });
});
