import type { SkillFamily, FamilyShares } from './skillFamily.ts';
import { presentShares } from './skillFamily.ts';

/**
 * Dimension weights from family shares: each family gets its share of the whole, divided among its
 * dimensions in proportion to their within-family weights (reliability and redundancy within the
 * family, see redundancyWeights.ts with `family`):
 *
 *   w_j = share_f(j) * within_j / sum of within_k over the dimensions k of family f(j)
 *
 * so the weights of one family sum to its share and all weights sum to 1. Shares of families absent
 * from the group are left out and the rest rescaled (presentShares). A family whose within-family
 * weights are all 0 gets nothing. Project choice (see skillFamily.ts).
 *
 * @example
 * familyWeights(['power', 'power', 'running'], [1, 3, 2], { power: 0.6, running: 0.4 })
 * // => [0.15, 0.45, 0.4]
 */
export function familyWeights(families: readonly SkillFamily[], within: ArrayLike<number>, shares: FamilyShares): Float64Array {
  const share = presentShares(shares, families);
  const sum = new Map<SkillFamily, number>();
  families.forEach((f, j) => sum.set(f, (sum.get(f) ?? 0) + (within[j] as number)));
  return Float64Array.from(families, (f, j) => {
    const s = sum.get(f) ?? 0;
    return s > 0 ? ((share.get(f) ?? 0) * (within[j] as number)) / s : 0;
  });
}

/**
 * The share of the total weight each family holds, in the order families first appear (weights of
 * any scale; shares sum to 1).
 *
 * @example
 * familyTotals(['power', 'power', 'running'], [1, 1, 2]) // => Map { power => 0.5, running => 0.5 }
 */
export function familyTotals(families: readonly SkillFamily[], weights: ArrayLike<number>): Map<SkillFamily, number> {
  const out = new Map<SkillFamily, number>();
  let total = 0;
  families.forEach((f, j) => {
    const w = weights[j] as number;
    out.set(f, (out.get(f) ?? 0) + w);
    total += w;
  });
  for (const [f, w] of out) out.set(f, total > 0 ? w / total : 0);
  return out;
}
