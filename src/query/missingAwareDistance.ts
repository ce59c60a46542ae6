/** Result of comparing a target with one candidate over the dimensions both have. */
export interface PairDistance {
  /** Weighted squared distance over shared dimensions, scaled up to the target's full weight. */
  readonly d2: number;
  /** Shared weight / target weight, 0 to 1. */
  readonly coverage: number;
}

/**
 * Missing-aware weighted distance (a project choice, in the spirit of the "available case" distance
 * of Gower 1971): with T the target's dimensions and S those the candidate also has,
 *   d^2 = sum_{i in S} w_i (t_i - c_i)^2 * W_T / W_S,   coverage = W_S / W_T,
 * W the summed weights. A dimension missing on either side is left out, never treated as average;
 * the rescaling keeps distances with fewer shared dimensions on the same scale.
 * Returns coverage 0 (and d2 Infinity) when nothing is shared.
 *
 * @example
 * // target [0, 1, NaN], candidate [1, 1, 2], weights [1, 1, 1]: S = {0, 1}, W_T = W_S = 2,
 * // d2 = 1 * 2 / 2 = 1, coverage 1
 */
export function missingAwareDistance(
  target: Float32Array | Float64Array,
  candidate: Float32Array | Float64Array,
  offset: number,
  weights: Float64Array,
  targetWeight: number,
  missing: MissingRule = 'rescale',
): PairDistance {
  const d = weights.length;
  let sum = 0;
  let shared = 0;
  let expected = 0;
  for (let j = 0; j < d; j++) {
    const w = weights[j] ?? 0;
    if (w === 0) continue;
    const t = target[j] ?? NaN;
    if (Number.isNaN(t)) continue;
    const c = candidate[offset + j] ?? NaN;
    if (Number.isNaN(c)) {
      expected += w * (t * t + 1);
      continue;
    }
    const diff = t - c;
    sum += w * diff * diff;
    shared += w;
  }
  if (shared === 0 || targetWeight === 0) return { d2: Infinity, coverage: 0 };
  if (missing === 'expected') return { d2: sum + expected, coverage: shared / targetWeight };
  return { d2: (sum * targetWeight) / shared, coverage: shared / targetWeight };
}

/**
 * `rescale`: a dimension the candidate lacks is left out and the shared ones scaled up to the target's
 * weight. `expected`: it counts at the expected squared gap between the target's value t and an unknown
 * standardised value (mean 0, variance 1 in its stratum): E[(t - C)^2] = t^2 + 1.
 */
export type MissingRule = 'rescale' | 'expected';

/** Total weight of the dimensions the target has (W_T). */
export function targetWeight(target: Float32Array | Float64Array, weights: Float64Array): number {
  let s = 0;
  for (let j = 0; j < weights.length; j++) if (!Number.isNaN(target[j] ?? NaN)) s += weights[j] ?? 0;
  return s;
}
