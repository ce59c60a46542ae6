import { describe, expect, it } from 'vitest';
import { fip } from '../../src/stats/fip.ts';

// Reference: common practice (from memory), FIP = (13 HR + 3 (BB + HBP) - 2 SO) / IP + C, with IP = outs / 3;
// values worked by hand.
describe('fip({ HR, BB, HBP, SO, outs }, constant)', () => {
  it('gives the doc example: 65 / 180 + 3.1 over 540 outs (180 IP)', () => {
    expect(fip({ HR: 20, BB: 50, HBP: 5, SO: 180, outs: 540 }, 3.1)).toBeCloseTo(65 / 180 + 3.1, 12);
  });
  it('reads innings as outs: one inning (3 outs) with one home run is 13 + C', () => {
    expect(fip({ HR: 1, BB: 0, HBP: 0, SO: 0, outs: 3 }, 3)).toBeCloseTo(16, 12);
  });
  it('handles partial innings: 6.2 IP is 20 outs', () => {
    // 1 HR, 2 BB, 0 HBP, 7 SO over 20/3 innings: (13 + 6 - 14) / (20/3) = 5 * 3 / 20 = 0.75, + 3.2
    expect(fip({ HR: 1, BB: 2, HBP: 0, SO: 7, outs: 20 }, 3.2)).toBeCloseTo(3.95, 12);
  });
  it('returns NaN with no outs recorded', () => {
    expect(fip({ HR: 1, BB: 1, HBP: 0, SO: 0, outs: 0 }, 3.1)).toBeNaN();
  });
});
