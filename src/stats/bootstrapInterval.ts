/**
 * Percentile bootstrap interval of a statistic of paired cases: resample the cases with replacement
 * `rounds` times, compute the statistic each time, and take its alpha/2 and 1 - alpha/2 quantiles.
 *
 * Source: Efron and Tibshirani (1993), An Introduction to the Bootstrap, chapter 13 (the percentile
 * interval). Deterministic for a seed (src/random/SeededRandom.ts).
 *
 * @example
 * bootstrapInterval(100, (idx) => mean(idx.map((i) => xs[i])), { rounds: 1000, seed: 1 }); // => [lo, hi]
 */
import { SeededRandom } from '../random/SeededRandom.ts';

export interface BootstrapOptions {
  readonly rounds?: number;
  readonly alpha?: number;
  readonly seed?: number;
}

export function bootstrapInterval(n: number, statistic: (indices: readonly number[]) => number, options: BootstrapOptions = {}): readonly [number, number] {
  const rounds = options.rounds ?? 1000;
  const alpha = options.alpha ?? 0.05;
  if (n < 2) return [NaN, NaN];
  const rng = new SeededRandom(options.seed ?? 1);
  const values: number[] = [];
  const idx = new Array<number>(n);
  for (let r = 0; r < rounds; r++) {
    for (let i = 0; i < n; i++) idx[i] = rng.int(n);
    const v = statistic(idx);
    if (Number.isFinite(v)) values.push(v);
  }
  values.sort((a, b) => a - b);
  if (values.length === 0) return [NaN, NaN];
  const at = (q: number): number => values[Math.min(values.length - 1, Math.max(0, Math.floor(q * values.length)))] as number;
  return [at(alpha / 2), at(1 - alpha / 2)];
}
