/**
 * Isotonic (non-decreasing) regression by pool-adjacent-violators (PAV): the non-decreasing sequence
 * closest to y in weighted least squares, used to map raw scores to calibrated probabilities.
 *
 * Source: Ayer, Brunk, Ewing, Reid and Silverman (1955), "An empirical distribution function for
 * sampling with incomplete information", Annals of Mathematical Statistics 26(4) (the PAV algorithm);
 * as a calibration map, Zadrozny and Elkan (2002), "Transforming classifier scores into accurate
 * multiclass probability estimates", KDD. Each block of pooled neighbours takes their weighted mean.
 *
 * @example
 * isotonicRegression([1, 3, 2, 4]); // => [1, 2.5, 2.5, 4]
 */
export function isotonicRegression(y: readonly number[], w?: readonly number[]): number[] {
  if (w !== undefined && w.length !== y.length) throw new RangeError('isotonicRegression: weights and values differ in length');
  const means: number[] = [], weights: number[] = [], sizes: number[] = [];
  for (let i = 0; i < y.length; i++) {
    let m = y[i] as number, wt = w ? (w[i] as number) : 1, size = 1;
    while (means.length > 0 && (means[means.length - 1] as number) > m) {
      const pm = means.pop() as number, pw = weights.pop() as number, ps = sizes.pop() as number;
      m = (pm * pw + m * wt) / (pw + wt);
      wt += pw;
      size += ps;
    }
    means.push(m);
    weights.push(wt);
    sizes.push(size);
  }
  const out: number[] = [];
  for (let b = 0; b < means.length; b++) for (let j = 0; j < (sizes[b] as number); j++) out.push(means[b] as number);
  return out;
}

/** A fitted isotonic map from a score to a value: a step function over the sorted training scores. */
export interface IsotonicMap {
  /** Right ends of each step (increasing scores) and the value on it. */
  readonly scores: readonly number[];
  readonly values: readonly number[];
}

/** Fits the map on (score, outcome) pairs: sort by score, then PAV on the outcomes (1 or 0, or any value). */
export function fitIsotonicMap(scores: readonly number[], outcomes: readonly number[]): IsotonicMap {
  const order = scores.map((_, i) => i).sort((a, b) => (scores[a] as number) - (scores[b] as number));
  const fitted = isotonicRegression(order.map((i) => outcomes[i] as number));
  const s: number[] = [], v: number[] = [];
  for (let j = 0; j < order.length; j++) {
    const x = scores[order[j] as number] as number, value = fitted[j] as number;
    if (s.length > 0 && s[s.length - 1] === x) {
      v[v.length - 1] = value;
      continue;
    }
    s.push(x);
    v.push(value);
  }
  return { scores: s, values: v };
}

/** The map's value at a score: linear between the fitted points, held outside them. */
export function applyIsotonicMap(map: IsotonicMap, score: number): number {
  const { scores, values } = map;
  if (scores.length === 0) return NaN;
  if (score <= (scores[0] as number)) return values[0] as number;
  if (score >= (scores[scores.length - 1] as number)) return values[values.length - 1] as number;
  let lo = 0, hi = scores.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((scores[mid] as number) <= score) lo = mid;
    else hi = mid;
  }
  const x0 = scores[lo] as number, x1 = scores[hi] as number, y0 = values[lo] as number, y1 = values[hi] as number;
  return y0 + ((score - x0) / (x1 - x0)) * (y1 - y0);
}
