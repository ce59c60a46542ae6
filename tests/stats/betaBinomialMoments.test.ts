import { describe, expect, it } from 'vitest';
import { betaBinomialMoments } from '../../src/stats/betaBinomialMoments.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';

describe('betaBinomialMoments(successes, trials)', () => {
  it('matches the method-of-moments example worked by hand (equal n: (s² - p̄(1 - p̄)/n) / (1 - 1/n))', () => {
    // p = 0.1, 0.3, 0.5, 0.7; p̄ = 0.4; s² = 0.2 / 3; σ² = (0.2/3 - 0.024) / 0.9 = 0.047407; k = 0.24 / σ² - 1 = 4.0625
    const fit = betaBinomialMoments([1, 3, 5, 7], [10, 10, 10, 10]);
    expect(fit.mean).toBeCloseTo(0.4, 12);
    expect(fit.talentVariance).toBeCloseTo(0.0474074, 6);
    expect(fit.k).toBeCloseTo(4.0625, 9);
  });

  it('recovers α + β of a beta-binomial from its published moments (Var X = nαβ(α+β+n) / ((α+β)²(α+β+1)), from memory)', () => {
    // Beta(2, 8), n = 20: E[X/n] = 0.2, Var(X/n) = 20·2·8·30 / (100·11) / 400 = 0.0218182; talent variance
    // αβ / ((α+β)²(α+β+1)) = 16 / 1100; two players at 0.2 ± d carry that sample variance when 2d² = Var(X/n).
    const n = 20;
    const varRate = (n * 2 * 8 * (10 + n)) / (100 * 11) / (n * n);
    const d = Math.sqrt(varRate / 2);
    const fit = betaBinomialMoments([(0.2 - d) * n, (0.2 + d) * n], [n, n]);
    expect(fit.talentVariance).toBeCloseTo(16 / 1100, 10);
    expect(fit.k).toBeCloseTo(10, 8);
  });

  it('recovers a known talent variance on simulated binomial data (unequal samples) within its standard error', () => {
    // talents uniform on [0.15, 0.35]: σ² = 0.2² / 12; samples 50-650 trials; 200 leagues of 300 players
    const rng = new SeededRandom(11);
    const truth = 0.04 / 12;
    const estimates: number[] = [];
    for (let rep = 0; rep < 200; rep++) {
      const x: number[] = [];
      const t: number[] = [];
      for (let i = 0; i < 300; i++) {
        const theta = 0.15 + 0.2 * rng.next();
        const n = 50 + rng.int(601);
        let s = 0;
        for (let j = 0; j < n; j++) if (rng.next() < theta) s++;
        x.push(s);
        t.push(n);
      }
      estimates.push(betaBinomialMoments(x, t).talentVariance);
    }
    const mean = estimates.reduce((a, b) => a + b, 0) / estimates.length;
    const sd = Math.sqrt(estimates.reduce((a, b) => a + (b - mean) ** 2, 0) / (estimates.length - 1));
    const se = sd / Math.sqrt(estimates.length);
    expect(Math.abs(mean - truth)).toBeLessThan(3 * se);
    // the mean binomial noise is several times the talent variance here, so a fit that forgot it would be far off
    expect(sd).toBeLessThan(truth / 3);
  });

  it('reports no k when the spread is all noise (talent variance not positive) or there is under two players', () => {
    expect(betaBinomialMoments([5, 5, 5, 5], [10, 10, 10, 10]).k).toBeNaN();
    expect(betaBinomialMoments([5], [10]).k).toBeNaN();
    expect(betaBinomialMoments([1, 3, 0], [10, 10, 0]).players).toBe(2);
  });
});
