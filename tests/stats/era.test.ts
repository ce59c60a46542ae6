import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { era } from '../../src/stats/era.ts';

// Reference: Official Baseball Rules definition of earned run average, 9 * ER / IP, with IP = outs / 3;
// values worked by hand.
describe('era: { ER, outs }', () => {
  it('gives the doc example: 60 ER over 540 outs (180 IP) is 3.00', () => {
    expect(rateOf(era, { ER: 60, outs: 540 })).toBeCloseTo(3, 12);
  });
  it('reads innings as outs: 1 ER in 1 inning (3 outs) is 9.00, in 6.2 IP (20 outs) is 1.35', () => {
    expect(rateOf(era, { ER: 1, outs: 3 })).toBeCloseTo(9, 12);
    expect(rateOf(era, { ER: 1, outs: 20 })).toBeCloseTo(1.35, 12);
  });
  it('returns NaN with no outs recorded', () => {
    expect(rateOf(era, { ER: 2, outs: 0 })).toBeNaN();
  });
});
