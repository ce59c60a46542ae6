import { describe, expect, it } from 'vitest';
import { ops } from '../../src/stats/ops.ts';
import { onBasePercentage } from '../../src/stats/onBasePercentage.ts';
import { sluggingPercentage } from '../../src/stats/sluggingPercentage.ts';

// Reference: common practice, OPS = OBP + SLG; values worked by hand.
describe('ops(OBP, SLG)', () => {
  it('gives the doc example: .350 + .450 = .800', () => {
    expect(ops(0.35, 0.45)).toBeCloseTo(0.8, 12);
  });
  it('adds a hand-worked line: OBP 3/6 = .500 and SLG 5/4 = 1.250 give 1.750', () => {
    expect(ops(onBasePercentage(2, 1, 0, 4, 1), sluggingPercentage(5, 4))).toBeCloseTo(1.75, 12);
  });
  it('passes NaN through', () => {
    expect(ops(NaN, 0.4)).toBeNaN();
  });
});
