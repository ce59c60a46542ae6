import { describe, expect, it } from 'vitest';
import { weightedQuantile, weightedQuantiles } from '../../src/stats/quantile.ts';

// Reference: the weighted percentile method (Wikipedia, "Percentile", "The weighted percentile method"):
// positions p_i = (S_i - w_i / 2) / S_N, linear interpolation between them. Values worked by hand.
describe('weightedQuantile(values, weights, p)', () => {
  it('gives the doc example: [10, 20, 30] weighted [1, 2, 1] sit at .125, .5, .875', () => {
    expect(weightedQuantile([10, 20, 30], [1, 2, 1], 0.5)).toBeCloseTo(20, 12);
    // 10 + (0.3 - 0.125) / (0.5 - 0.125) * (20 - 10) = 14.6667 (by hand)
    expect(weightedQuantile([10, 20, 30], [1, 2, 1], 0.3)).toBeCloseTo(14.666666666666666, 12);
    // 20 + (0.8 - 0.5) / (0.875 - 0.5) * 10 = 28 (by hand)
    expect(weightedQuantile([10, 20, 30], [1, 2, 1], 0.8)).toBeCloseTo(28, 12);
  });

  it('gives the worked example of docs/jobs.md: 95 and 120 weighted 50 and 90 => p10 95, p50 111.07, p90 120', () => {
    // positions (50 - 25) / 140 = 0.1786 and (140 - 45) / 140 = 0.6786 (by hand)
    expect(weightedQuantiles([120, 95], [90, 50], [0.1, 0.5, 0.9])).toEqual([95, expect.closeTo(95 + ((0.5 - 25 / 140) / 0.5) * 25, 10), 120]);
  });

  it('with equal weights is definition 5 of Hyndman and Fan (1996), R quantile(type = 5)', () => {
    // Definition 5: j = floor(n p + 1/2), g = n p + 1/2 - j, Q = x_j + g (x_{j+1} - x_j); for x = 1..10
    // p = .25 => n p + .5 = 3 => 3; p = .1 => 1.5; p = .9 => 9.5; p = .37 => 4.2 (by hand).
    const x = [7, 3, 10, 1, 5, 2, 9, 4, 8, 6];
    const w = x.map(() => 1);
    expect(weightedQuantile(x, w, 0.25)).toBeCloseTo(3, 12);
    expect(weightedQuantile(x, w, 0.1)).toBeCloseTo(1.5, 12);
    expect(weightedQuantile(x, w, 0.9)).toBeCloseTo(9.5, 12);
    expect(weightedQuantile(x, w, 0.37)).toBeCloseTo(4.2, 12);
  });

  it('holds the first and last values beyond the outer positions', () => {
    expect(weightedQuantile([1, 2, 3, 4], [1, 1, 1, 1], 0.1)).toBe(1); // p_1 = .125
    expect(weightedQuantile([1, 2, 3, 4], [1, 1, 1, 1], 0.95)).toBe(4); // p_4 = .875
    expect(weightedQuantile([42], [3], 0.5)).toBe(42);
  });

  it('does not change when every weight is scaled, nor with the input order', () => {
    const v = [5, 1, 9, 3, 7];
    const w = [0.5, 2, 1, 3, 1.5];
    const ps = [0.1, 0.5, 0.9];
    const base = weightedQuantiles(v, w, ps);
    const scaled = weightedQuantiles(v, w.map((x) => x * 37), ps);
    const order = [4, 2, 0, 3, 1];
    const shuffled = weightedQuantiles(order.map((i) => v[i] as number), order.map((i) => w[i] as number), ps);
    base.forEach((q, i) => {
      expect(scaled[i]).toBeCloseTo(q, 12);
      expect(shuffled[i]).toBeCloseTo(q, 12);
    });
  });

  it('leaves out zero weights and NaN values', () => {
    expect(weightedQuantile([10, 20, 30, 1000, NaN], [1, 2, 1, 0, 5], 0.3)).toBeCloseTo(14.666666666666666, 12);
  });

  it('moves towards a value whose weight grows', () => {
    const light = weightedQuantile([100, 200], [1, 1], 0.5);
    const heavy = weightedQuantile([100, 200], [1, 9], 0.5);
    expect(light).toBeCloseTo(150, 12);
    expect(heavy).toBeGreaterThan(light);
  });

  it('returns NaN for an empty sample or p outside 0 to 1', () => {
    expect(weightedQuantile([], [], 0.5)).toBeNaN();
    expect(weightedQuantile([1, 2], [0, 0], 0.5)).toBeNaN();
    expect(weightedQuantile([1, 2], [1, 1], 1.5)).toBeNaN();
  });

  it('refuses values and weights of different lengths', () => {
    expect(() => weightedQuantile([1, 2], [1], 0.5)).toThrow(RangeError);
  });
});
