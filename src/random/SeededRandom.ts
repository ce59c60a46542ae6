import type { Rng } from './Rng.ts';

/**
 * A small seeded pseudo-random generator, so that a league is a pure
 * function of its seed.
 *
 * Uniforms come from sfc32 (Small Fast Counting, 128-bit state, 32-bit
 * output), a public-domain generator by Chris Doty-Humphrey from the PractRand
 * suite (https://pracrand.sourceforge.net/); its state is filled from the seed
 * with splitmix32 steps (Steele, Lea and Flood, "Fast splittable pseudorandom
 * number generators", OOPSLA 2014), and the first outputs are discarded.
 * Normals use the Box-Muller transform (Box and Muller, 1958); binomial and
 * Poisson counts use exact inversion for small means and the normal
 * approximation (with continuity rounding, clamped to the support) when the
 * variance is at least 9, as in common practice.
 *
 * @example
 * const a = new SeededRandom(7); const b = new SeededRandom(7);
 * a.next() === b.next(); // => true, and every later draw matches too
 */
export class SeededRandom implements Rng {
  private a: number;
  private b: number;
  private c: number;
  private d: number;
  private spare = 0;
  private hasSpare = false;

  constructor(seed: number) {
    let s = seed >>> 0;
    const step = (): number => {
      s = (s + 0x9e3779b9) >>> 0;
      let z = s;
      z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
      z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
      return (z ^ (z >>> 16)) >>> 0;
    };
    this.a = step();
    this.b = step();
    this.c = step();
    this.d = 1;
    for (let i = 0; i < 15; i++) this.nextUint32();
  }

  /** A uniform 32-bit unsigned integer. */
  nextUint32(): number {
    const t = (((this.a + this.b) | 0) + this.d) | 0;
    this.d = (this.d + 1) | 0;
    this.a = this.b ^ (this.b >>> 9);
    this.b = (this.c + (this.c << 3)) | 0;
    this.c = (this.c << 21) | (this.c >>> 11);
    this.c = (this.c + t) | 0;
    return t >>> 0;
  }

  /** A uniform number in [0, 1). */
  next(): number {
    return this.nextUint32() / 4294967296;
  }

  /** A uniform number in [lo, hi). */
  uniform(lo: number, hi: number): number {
    return lo + (hi - lo) * this.next();
  }

  /** A uniform integer in 0 .. n-1. */
  int(n: number): number {
    return Math.floor(this.next() * n);
  }

  /** True with probability p. */
  chance(p: number): boolean {
    return this.next() < p;
  }

  /** A standard normal draw (Box-Muller, the second value kept for the next call). */
  normal(): number {
    if (this.hasSpare) {
      this.hasSpare = false;
      return this.spare;
    }
    let u = this.next();
    while (u <= 0) u = this.next();
    const v = this.next();
    const r = Math.sqrt(-2 * Math.log(u));
    this.spare = r * Math.sin(2 * Math.PI * v);
    this.hasSpare = true;
    return r * Math.cos(2 * Math.PI * v);
  }

  /** A binomial(n, p) count, always in 0 .. n. */
  binomial(n: number, p: number): number {
    if (n <= 0 || p <= 0) return 0;
    if (p >= 1) return n;
    if (p > 0.5) return n - this.binomial(n, 1 - p);
    if (n < 16) {
      let k = 0;
      for (let i = 0; i < n; i++) if (this.next() < p) k++;
      return k;
    }
    const variance = n * p * (1 - p);
    if (variance >= 9) {
      const x = Math.round(n * p + Math.sqrt(variance) * this.normal());
      return x < 0 ? 0 : x > n ? n : x;
    }
    // Inversion by sequential search of the CDF (mean below about 18 here).
    const q = 1 - p;
    const s = p / q;
    const a = (n + 1) * s;
    let r = Math.pow(q, n);
    let u = this.next();
    let x = 0;
    while (u > r && x < n) {
      u -= r;
      x++;
      r *= a / x - s;
    }
    return x;
  }

  /** A Poisson(mean) count. */
  poisson(mean: number): number {
    if (mean <= 0) return 0;
    if (mean >= 9) {
      const x = Math.round(mean + Math.sqrt(mean) * this.normal());
      return x < 0 ? 0 : x;
    }
    let r = Math.exp(-mean);
    let u = this.next();
    let x = 0;
    while (u > r && x < 1000) {
      u -= r;
      x++;
      r *= mean / x;
    }
    return x;
  }
}
