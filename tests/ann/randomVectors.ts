/**
 * Seeded random rows for tests (invented data, never reference values).
 * Generator: Mulberry32 by Tommy Ettinger, a public-domain 32-bit PRNG (from memory).
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** `count` rows of `dim` values uniform in [0, 1), row-major. */
export function randomVectors(count: number, dim: number, seed: number): Float32Array {
  const next = mulberry32(seed);
  const out = new Float32Array(count * dim);
  for (let i = 0; i < out.length; i++) out[i] = next();
  return out;
}

/** Row i of a row-major matrix as a plain array. */
export function row(vectors: Float32Array, dim: number, i: number): number[] {
  return Array.from(vectors.subarray(i * dim, (i + 1) * dim));
}

/** Share of the exact top-k labels that the approximate top-k found (recall@k), averaged over queries. */
export function meanRecall(exact: readonly (readonly number[])[], approximate: readonly (readonly number[])[]): number {
  let found = 0;
  let total = 0;
  exact.forEach((truth, q) => {
    const got = new Set(approximate[q] ?? []);
    for (const label of truth) if (got.has(label)) found++;
    total += truth.length;
  });
  return total === 0 ? 1 : found / total;
}
