/** A seeded pseudo-random source, as the embedding, the bootstrap and the samplers need it. */
export interface Rng {
  /** Uniform in [0, 1). */
  next(): number;
  /** Uniform integer in [0, n). */
  int(n: number): number;
  /** Standard normal. */
  normal(): number;
}
