import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { assistRate } from '../../src/stats/assistRate.ts';
import { rangeFactor } from '../../src/stats/rangeFactor.ts';

// Reference: common practice, assists per nine innings = 9 * A / innings, with innings = outs / 3 (the
// assists half of RF/9 = 9 * (PO + A) / innings); values worked by hand.
describe('assistRate: { A, outs }', () => {
  it('gives the doc example: 8 assists over 1200 innings (3600 outs) is 0.06', () => {
    expect(rateOf(assistRate, { A: 8, outs: 3600 })).toBeCloseTo(0.06, 12);
  });
  it('is range factor without the putouts', () => {
    const line = { PO: 240, A: 11, outs: 3000 };
    expect(rateOf(assistRate, line)).toBeCloseTo(rateOf(rangeFactor, line) - rateOf(rangeFactor, { ...line, A: 0 }), 12);
  });
  it('returns NaN with no innings in the field', () => {
    expect(rateOf(assistRate, { A: 1, outs: 0 })).toBeNaN();
  });
});
