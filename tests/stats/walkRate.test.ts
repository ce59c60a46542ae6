import { describe, expect, it } from 'vitest';
import { walkRate } from '../../src/stats/walkRate.ts';

// Reference: common practice, walks per plate appearance; values worked by hand.
describe('walkRate(BB, PA)', () => {
  it('gives the doc example: walkRate(60, 600) = 0.1', () => {
    expect(walkRate(60, 600)).toBeCloseTo(0.1, 12);
  });
  it('divides the events by the opportunities: walkRate(9, 72) = 0.125', () => {
    expect(walkRate(9, 72)).toBeCloseTo(0.125, 12);
  });
  it('returns NaN with no opportunities', () => {
    expect(walkRate(0, 0)).toBeNaN();
  });
});
