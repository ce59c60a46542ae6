import { describe, expect, it } from 'vitest';
import { fitLogistic, logisticProbability } from '../../src/stats/fitLogistic.ts';

// Reference: the logistic maximum-likelihood fit (McCullagh and Nelder 1989): with one 0/1 feature the
// fitted probabilities equal each group's observed share (closed form); at the optimum the score
// equations sum (y - p) x = 0 hold.
describe('fitLogistic(x, y)', () => {
  it('returns the groups\' observed log-odds for a single 0/1 feature', () => {
    const x = [[0], [0], [0], [0], [1], [1], [1], [1]];
    const y = [1, 0, 0, 0, 1, 1, 1, 0].map(Boolean);
    const fit = fitLogistic(x, y, { ridge: 0 });
    expect(fit.coefficients[0]).toBeCloseTo(Math.log(1 / 3), 8);
    expect(fit.coefficients[1]).toBeCloseTo(2 * Math.log(3), 8);
    expect(logisticProbability(fit, [1])).toBeCloseTo(0.75, 8);
  });

  it('satisfies the score equations on a continuous feature', () => {
    const x = [-2, -1.5, -1, -0.5, 0, 0.5, 1, 1.5, 2, 2.5].map((v) => [v]);
    const y = [0, 0, 1, 0, 0, 1, 0, 1, 1, 1].map(Boolean);
    const fit = fitLogistic(x, y, { ridge: 0 });
    let s0 = 0, s1 = 0;
    x.forEach((row, i) => {
      const r = (y[i] ? 1 : 0) - logisticProbability(fit, row);
      s0 += r;
      s1 += r * (row[0] as number);
    });
    expect(Math.abs(s0)).toBeLessThan(1e-8);
    expect(Math.abs(s1)).toBeLessThan(1e-8);
    expect(fit.coefficients[1]).toBeGreaterThan(0);
  });

  it('stays finite on separable data thanks to the ridge', () => {
    const fit = fitLogistic([[0], [1]], [false, true], { ridge: 0.1 });
    expect(fit.coefficients.every(Number.isFinite)).toBe(true);
  });
});
