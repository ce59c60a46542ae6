/** A seeded pseudo-random source: the same seed gives the same sequence on every platform. */
export interface Rng {
  /** Uniform in [0, 1). */
  next(): number;
  /** Uniform integer in [0, n). */
  int(n: number): number;
  /** Standard normal (Box-Muller transform). */
  normal(): number;
}

/**
 * Seeded PRNG: mulberry32 (Tommy Ettinger's 32-bit generator, public domain; constants from memory),
 * period 2^32, enough for shuffling, weight initialisation and dropout masks. The seed is reduced to
 * 32 bits. Normals by the Box-Muller transform (Box and Muller 1958).
 *
 * @example
 * const a = createRng(7), b = createRng(7);
 * a.next() === b.next(); // => true
 */
export function createRng(seed: number): Rng {
  let state = (Math.trunc(seed) ^ 0x9e3779b9) >>> 0;
  const next = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    int: (n: number) => Math.floor(next() * n),
    normal: () => {
      const u = 1 - next(); // (0, 1]
      const v = next();
      return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    },
  };
}

/**
 * Fisher-Yates shuffle in place (Durstenfeld's version; Knuth, TAOCP vol. 2, Algorithm P).
 *
 * @example
 * shuffleInPlace(Int32Array.from([0, 1, 2, 3]), createRng(1)); // a permutation of 0..3
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
