import type { Rng } from './Rng.ts';

/**
 * Fisher-Yates shuffle in place (Durstenfeld's version; Knuth, TAOCP vol. 2, Algorithm P).
 *
 * @example
 * shuffleInPlace(Int32Array.from([0, 1, 2, 3]), new SeededRandom(1)); // a permutation of 0..3
 */
export function shuffleInPlace(a: Int32Array, rng: Rng): Int32Array {
  for (let i = a.length - 1; i > 0; i--) {
    const j = rng.int(i + 1);
    const t = a[i] ?? 0;
    a[i] = a[j] ?? 0;
    a[j] = t;
  }
  return a;
}
