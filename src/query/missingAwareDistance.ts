import { lineValue, type CoreImputer } from './fitCoreImputer.ts';

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
 * the rescaling keeps distances with fewer shared dimensions on the same scale. Other rules for a
 * dimension the candidate lacks: see MissingRule.
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
  const impute = typeof missing === 'object' ? missing.impute : null;
  let sum = 0;
  let shared = 0;
  let counted = 0;
  let expected = 0;
  for (let j = 0; j < d; j++) {
    const w = weights[j] ?? 0;
    if (w === 0) continue;
    const t = target[j] ?? NaN;
    if (Number.isNaN(t)) continue;
    const c = candidate[offset + j] ?? NaN;
    if (Number.isNaN(c)) {
      if (impute) {
        const line = impute.lines[j];
        if (!line) continue;
        const guess = lineValue(line, candidate, offset, impute.core);
        sum += w * ((t - guess) ** 2 + (impute.residual[j] as number));
        counted += w;
        continue;
      }
      expected += w * (t * t + 1);
      continue;
    }
    const diff = t - c;
    sum += w * diff * diff;
    shared += w;
    counted += w;
  }
  if (shared === 0 || targetWeight === 0) return { d2: Infinity, coverage: 0 };
  if (impute) return { d2: (sum * targetWeight) / counted, coverage: shared / targetWeight };
  if (missing === 'expected') return { d2: sum + expected, coverage: shared / targetWeight };
  return { d2: (sum * targetWeight) / shared, coverage: shared / targetWeight };
}

/**
 * `rescale`: a dimension the candidate lacks is left out and the shared ones scaled up to the target's
 * weight. `expected`: it counts at the expected squared gap between the target's value t and an unknown
 * standardised value (mean 0, variance 1 in its stratum): E[(t - C)^2] = t^2 + 1. `{ impute }`: it
 * counts at the expected squared gap given the candidate's core dimensions (fitCoreImputer): with c^
 * his imputed value and s^2 the line's residual variance, E[(t - C)^2] = (t - c^)^2 + s^2 (the
 * bias-variance decomposition; `expected` is the case c^ = 0, s^2 = 1); a dimension without a line is
 * left out and the rest, imputed ones included, scaled up to the target's weight.
 */
export type MissingRule = 'rescale' | 'expected' | { readonly impute: CoreImputer };

/** Total weight of the dimensions the target has (W_T). */
export function targetWeight(target: Float32Array | Float64Array, weights: Float64Array): number {
  let s = 0;
  for (let j = 0; j < weights.length; j++) if (!Number.isNaN(target[j] ?? NaN)) s += weights[j] ?? 0;
  return s;
}
