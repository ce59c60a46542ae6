import { missingAwareDistance, targetWeight, type MissingRule } from '../query/missingAwareDistance.ts';
import { likeness } from '../query/likeness.ts';

/** The target's profile at one aligned season. */
export interface PathTargetStep {
  readonly z: Float64Array;
  /** W_j: the target's total weight at this step. */
  readonly weight: number;
}

export interface PathScore {
  /** Combined weighted squared distance, sum_j d2_j. */
  readonly d2: number;
  /** Combined target weight, sum_j W_j. */
  readonly weight: number;
  /** sum_j shared_j / sum_j W_j. */
  readonly coverage: number;
  /** Per step: likeness and coverage of that season alone. */
  readonly steps: readonly { readonly d2: number; readonly coverage: number; readonly likeness: number }[];
}

/** Prepares the target's steps (their total weights under `weights`). */
export function pathTargetSteps(zs: readonly Float64Array[], weights: Float64Array): PathTargetStep[] {
  return zs.map((z) => ({ z, weight: targetWeight(z, weights) }));
}

/**
 * Distance between two trajectories of N aligned seasons (a project choice): each season j is compared
 * with the missing-aware distance (src/query/missingAwareDistance.ts), which is already scaled to the
 * target's full weight W_j at that season, and the seasons are added with equal weight:
 *   d^2 = sum_j d2_j,   W = sum_j W_j,   likeness = 100 exp(-d^2 / (2 W)),   coverage = sum_j S_j / sum_j W_j,
 * S_j the weight shared at season j. Unrelated trajectories still score about 100 / e = 37, as single
 * seasons do, since each d2_j is about 2 W_j for unrelated players. A season with nothing shared makes the
 * whole trajectory incomparable (d2 Infinity, coverage 0).
 *
 * @param rows the candidate's row offsets (row * d) in `z`, one per step, same order as `target`
 * @example
 * // two steps, each target [0, 0], candidates [1, 0] and [0, 1], weights [1, 1]:
 * // d2 = 1 + 1 = 2, W = 4, likeness = 100 exp(-2 / 8) = 77.9
 */
export function pathDistance(target: readonly PathTargetStep[], z: Float32Array, offsets: readonly number[], weights: Float64Array, missing: MissingRule = 'rescale'): PathScore {
  let d2 = 0;
  let weight = 0;
  let shared = 0;
  const steps: { d2: number; coverage: number; likeness: number }[] = [];
  target.forEach((t, j) => {
    const p = missingAwareDistance(t.z, z, offsets[j] ?? NaN, weights, t.weight, missing);
    d2 += p.d2;
    weight += t.weight;
    shared += p.coverage * t.weight;
    steps.push({ d2: p.d2, coverage: p.coverage, likeness: likeness(Math.sqrt(p.d2), t.weight) });
  });
  if (!Number.isFinite(d2)) return { d2: Infinity, weight, coverage: 0, steps };
  return { d2, weight, coverage: weight > 0 ? shared / weight : 0, steps };
}
