import { describe, expect, it } from 'vitest';
import { whip } from '../../src/stats/whip.ts';

// Reference: common practice, WHIP = (BB + H) / IP, with IP = outs / 3; values worked by hand.
describe('whip(H, BB, outs)', () => {
  it('gives the doc example: 200 runners over 180 IP', () => {
    expect(whip(150, 50, 540)).toBeCloseTo(200 / 180, 12);
  });
  it('reads innings as outs: 5 H + 2 BB in 7 innings (21 outs) is 1.00', () => {
    expect(whip(5, 2, 21)).toBeCloseTo(1, 12);
  });
  it('returns NaN with no outs recorded', () => {
    expect(whip(1, 1, 0)).toBeNaN();
  });
});
