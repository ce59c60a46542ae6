import { PearsonSums } from '../stats/PearsonSums.ts';

/**
 * Season-to-season reliability of each standardised dimension: the Pearson correlation between a
 * player's value in one season and in his next (or at a second level the same season), over every
 * such pair of profiles in the group. This is the test-retest reliability of classical test theory
 * (Spearman 1904; common practice in baseball analysis as the "year-to-year correlation"): the share
 * of a dimension's spread that is lasting skill rather than sampling noise.
 * With `apart` N > 1 (profiles over windows of N seasons), a row is paired with each of the same
 * player's rows whose season is exactly N later: windows that share no season, so the correlation is
 * that of two independent samples of the window's size (overlapping windows would share their noise).
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
  apart = 1,
): Float64Array {
  const pairs = apart > 1 ? pairsApart(n, player, season, apart) : consecutivePairs(n, player, season);
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

/** Rows of the same player one season apart (or at two levels the same season), neighbours in (player, season) order. */
function consecutivePairs(n: number, player: ArrayLike<number>, season: ArrayLike<number>): [number, number][] {
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
  return pairs;
}

/** Every pair of rows of the same player whose seasons are exactly `apart` apart. */
function pairsApart(n: number, player: ArrayLike<number>, season: ArrayLike<number>, apart: number): [number, number][] {
  const rows = new Map<string, number[]>();
  for (let r = 0; r < n; r++) {
    const key = `${player[r]}|${season[r]}`;
    const list = rows.get(key);
    if (list) list.push(r);
    else rows.set(key, [r]);
  }
  const pairs: [number, number][] = [];
  for (let a = 0; a < n; a++) {
    for (const b of rows.get(`${player[a]}|${(season[a] as number) + apart}`) ?? []) pairs.push([a, b]);
  }
  return pairs;
}
