import { UsageError } from '../errors/KindredError.ts';

/**
 * Smallest number of leading principal components whose cumulative share of variance reaches
 * `threshold` (common practice, the "proportion of variance explained" rule; Jolliffe 2002,
 * Principal Component Analysis, section 6.1.1). Accepts shares or raw eigenvalues (divided by their
 * sum), in decreasing order. A tolerance of 1e-12 absorbs rounding in the running sum.
 *
 * @example
 * chooseComponents([0.5, 0.3, 0.15, 0.05], 0.9); // => 3 (0.5 + 0.3 = 0.8 < 0.9 <= 0.95)
 */
export function chooseComponents(explainedVariance: readonly number[], threshold = 0.9): number {
  if (!(threshold > 0 && threshold <= 1)) throw new UsageError(`chooseComponents: threshold ${threshold} (expected 0 < threshold <= 1)`);
  if (explainedVariance.length === 0) throw new UsageError('chooseComponents: no components (expected at least one share)');
  let total = 0;
  for (const v of explainedVariance) {
    if (!(v >= 0) || !Number.isFinite(v)) throw new UsageError(`chooseComponents: share ${v} (expected a finite number >= 0)`);
    total += v;
  }
  if (total === 0) return 1;
  let running = 0;
  for (let k = 0; k < explainedVariance.length; k++) {
    running += (explainedVariance[k] ?? 0) / total;
    if (running >= threshold - 1e-12) return k + 1;
  }
  return explainedVariance.length;
}
