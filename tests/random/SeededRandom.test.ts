import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../../src/random/SeededRandom.ts';

/** Mean and variance of a sample. */
function moments(xs: readonly number[]): { mean: number; variance: number } {
  const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
  const variance = xs.reduce((a, b) => a + (b - mean) ** 2, 0) / (xs.length - 1);
  return { mean, variance };
}

describe('SeededRandom', () => {
  it('new SeededRandom(seed) repeats the same sequence for the same seed', () => {
    const a = new SeededRandom(42);
    const b = new SeededRandom(42);
    for (let i = 0; i < 1000; i++) expect(a.nextUint32()).toBe(b.nextUint32());
  });

  it('new SeededRandom(seed) gives different sequences for neighbouring seeds', () => {
    const a = new SeededRandom(1);
    const b = new SeededRandom(2);
    let same = 0;
    for (let i = 0; i < 1000; i++) if (a.nextUint32() === b.nextUint32()) same++;
    expect(same).toBeLessThan(3);
  });

  it('next() is uniform on [0, 1): mean 1/2 and variance 1/12 (uniform distribution, textbook)', () => {
    const rng = new SeededRandom(7);
    const xs = Array.from({ length: 100_000 }, () => rng.next());
    expect(Math.min(...xs)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...xs)).toBeLessThan(1);
    const { mean, variance } = moments(xs);
    // Standard error of the mean: sqrt(1/12 / n) = 0.0009; allow 5 of them.
    expect(Math.abs(mean - 0.5)).toBeLessThan(0.0046);
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(0.002);
  });

  it('normal() has mean 0 and variance 1, with about 68.3% within one sd (normal distribution, textbook)', () => {
    const rng = new SeededRandom(11);
    const xs = Array.from({ length: 100_000 }, () => rng.normal());
    const { mean, variance } = moments(xs);
    expect(Math.abs(mean)).toBeLessThan(0.016);
    expect(Math.abs(variance - 1)).toBeLessThan(0.025);
    const within = xs.filter((x) => Math.abs(x) < 1).length / xs.length;
    expect(Math.abs(within - 0.6827)).toBeLessThan(0.008);
  });

  it.each([
    [10, 0.3],
    [200, 0.02],
    [600, 0.22],
    [50, 0.9],
  ])('binomial(%i, %f) stays in 0..n with mean np and variance np(1-p) (binomial distribution, textbook)', (n, p) => {
    const rng = new SeededRandom(n * 1000 + Math.round(p * 100));
    const xs = Array.from({ length: 40_000 }, () => rng.binomial(n, p));
    expect(xs.every((x) => Number.isInteger(x) && x >= 0 && x <= n)).toBe(true);
    const { mean, variance } = moments(xs);
    const v = n * p * (1 - p);
    expect(Math.abs(mean - n * p)).toBeLessThan(5 * Math.sqrt(v / xs.length) + 0.01);
    expect(Math.abs(variance / v - 1)).toBeLessThan(0.06);
  });

  it.each([[0.7], [4], [40]])('poisson(%f) has mean and variance equal to its mean (Poisson distribution, textbook)', (m) => {
    const rng = new SeededRandom(Math.round(m * 10));
    const xs = Array.from({ length: 40_000 }, () => rng.poisson(m));
    const { mean, variance } = moments(xs);
    expect(Math.abs(mean - m)).toBeLessThan(5 * Math.sqrt(m / xs.length));
    expect(Math.abs(variance / m - 1)).toBeLessThan(0.06);
  });
});
