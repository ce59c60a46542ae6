import { describe, expect, it } from 'vitest';
import { pairScale } from '../../src/embed/pairScale.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';
import { UsageError } from '../../src/errors/KindredError.ts';

describe('pairScale(codes, n, k, pairs, seed)', () => {
  it('is half the squared distance when every pair is the same pair (hand-worked: codes [0,0] and [3,4], 25 / 2)', () => {
    expect(pairScale(Float64Array.of(0, 0, 3, 4), 2, 2, 100, 1)).toBe(12.5);
  });

  it('approaches the code variance summed over coordinates for independent standard normal codes (E|x-y|^2 = 2k)', () => {
    // for x, y independent N(0, I_k): E||x - y||^2 = 2k, so s = k (a textbook identity)
    const rng = new SeededRandom(3);
    const n = 4000;
    const k = 3;
    const codes = Float64Array.from({ length: n * k }, () => rng.normal());
    expect(pairScale(codes, n, k, 50_000, 9)).toBeCloseTo(k, 1);
  });

  it('is reproducible for a seed', () => {
    const codes = Float64Array.from({ length: 40 }, (_, i) => Math.sin(i));
    expect(pairScale(codes, 20, 2, 500, 4)).toBe(pairScale(codes, 20, 2, 500, 4));
  });

  it('refuses fewer than two rows or a wrong length', () => {
    expect(() => pairScale(Float64Array.of(1, 2), 1, 2, 10, 1)).toThrow(UsageError);
    expect(() => pairScale(Float64Array.of(1, 2, 3), 2, 2, 10, 1)).toThrow(UsageError);
  });
});
