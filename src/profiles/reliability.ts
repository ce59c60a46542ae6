import { PearsonSums } from '../stats/PearsonSums.ts';

/**
 * Season-to-season reliability of each standardised dimension: the Pearson correlation between a
 * player's value in one season and in his next (or at a second level the same season), over every
 * such pair of profiles in the group. This is the test-retest reliability of classical test theory
 * (Spearman 1904; common practice in baseball analysis as the "year-to-year correlation"): the share
 * of a dimension's spread that is lasting skill rather than sampling noise.
 * Clamped to [0.02, 1]; a dimension with fewer than `minPairs` pairs gets `fallback`.
 *
 * @example
 * // a dimension that is pure noise scores about 0; a timed measurement such as run speed about 0.9
 */
export function reliability(
  z: Float64Array | Float32Array,
  n: number,
  d: number,
  player: ArrayLike<number>,
  season: ArrayLike<number>,
  minPairs = 30,
  fallback = 0.3,
): Float64Array {
  const order = Array.from({ length: n }, (_, i) => i).sort(
    (a, b) => (player[a] as number) - (player[b] as number) || (season[a] as number) - (season[b] as number),
  );
  const pairs: [number, number][] = [];
  for (let k = 1; k < order.length; k++) {
    const a = order[k - 1] as number;
    const b = order[k] as number;
    if (player[a] !== player[b]) continue;
    const gap = (season[b] as number) - (season[a] as number);
    if (gap === 0 || gap === 1) pairs.push([a, b]);
  }
  const out = new Float64Array(d);
  for (let j = 0; j < d; j++) {
    const sums = new PearsonSums();
    for (const [a, b] of pairs) {
      const x = z[a * d + j] as number;
      const y = z[b * d + j] as number;
      if (!Number.isNaN(x) && !Number.isNaN(y)) sums.add(x, y);
    }
    const rho = sums.correlation();
    out[j] = sums.n >= minPairs && !Number.isNaN(rho) ? Math.min(1, Math.max(0.02, rho)) : fallback;
  }
  return out;
}
