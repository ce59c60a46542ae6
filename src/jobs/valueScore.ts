import { UNRELATED_LIKENESS } from '../query/likeness.ts';

/**
 * The value score of a cheaper comp, 0 to 100 (project choice): how much of the target's profile he
 * offers beyond chance, times the share of the reference salary he saves,
 *
 *   value = 100 * (L - L0) / (100 - L0) * (S_ref - S) / S_ref, each factor clipped to 0..1,
 *
 * with L the comp's likeness, L0 = UNRELATED_LIKENESS (100 / e, what two unrelated players score),
 * S his salary and S_ref the reference: the target's salary, or the salary limit when the target has
 * none (a hand-built profile with a USD limit). Why this shape: likeness per million
 * (L / (S / 1e6)) grows without bound as the salary falls, so any comp at the league minimum outscored
 * every real comp (a likeness-37 comp at $500k scored 74 against 14.9 for a likeness-95 comp at
 * $6.4M). Here a comp no more alike than chance is worth 0 whatever he costs, the saving is bounded
 * (at most the whole reference salary), and both factors must be high for a high score. The same
 * two examples against a $12.8M target: 0.3 for the likeness-37 comp, 46 for the likeness-95 comp.
 * NaN when the salary or the reference is not a positive number.
 *
 * @example
 * valueScore(95, 6_400_000, 12_800_000); // => 46.0 (0.921 of the profile beyond chance, half the salary saved)
 * valueScore(37, 500_000, 12_800_000); // => 0.3
 * valueScore(36, 500_000, 12_800_000); // => 0 (no more alike than chance)
 */
export function valueScore(likeness: number, salaryUsd: number, referenceUsd: number): number {
  if (!(salaryUsd > 0) || !(referenceUsd > 0) || !Number.isFinite(likeness)) return NaN;
  const beyondChance = clip01((likeness - UNRELATED_LIKENESS) / (100 - UNRELATED_LIKENESS));
  const saved = clip01((referenceUsd - salaryUsd) / referenceUsd);
  return 100 * beyondChance * saved;
}

function clip01(x: number): number {
  return Math.min(1, Math.max(0, x));
}
