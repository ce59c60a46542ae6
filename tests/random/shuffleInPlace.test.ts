import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../../src/random/SeededRandom.ts';
import { shuffleInPlace } from '../../src/random/shuffleInPlace.ts';

describe('shuffleInPlace', () => {
  it('returns a permutation of its input, in place', () => {
    const a = Int32Array.from({ length: 50 }, (_, i) => i);
    const out = shuffleInPlace(a, new SeededRandom(5));
    expect(out).toBe(a);
    expect([...out].sort((x, y) => x - y)).toEqual(Array.from({ length: 50 }, (_, i) => i));
    expect([...out]).not.toEqual(Array.from({ length: 50 }, (_, i) => i));
  });

  it('makes every ordering of three items equally likely (Knuth, TAOCP vol. 2, 3.4.2, Algorithm P)', () => {
    const rng = new SeededRandom(17);
    const counts = new Map<string, number>();
    const n = 60000;
    for (let t = 0; t < n; t++) {
      const key = [...shuffleInPlace(Int32Array.from([0, 1, 2]), rng)].join('');
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
    expect(counts.size).toBe(6);
    // Each count is binomial(60000, 1/6): sd about 91, so 5 sd is about 460.
    for (const c of counts.values()) expect(Math.abs(c - n / 6)).toBeLessThan(460);
  });
});
