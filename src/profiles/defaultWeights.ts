import { familyWeights } from './familyWeights.ts';
import { redundancyWeights } from './redundancyWeights.ts';
import { reliability } from './reliability.ts';
import { DEFAULT_FAMILY_SHARES, SKILL_FAMILIES, type SkillFamily } from './skillFamily.ts';

/**
 * A group's default dimension weights from its standardised profiles (row-major n x d, NaN missing):
 * season-to-season reliability (reliability.ts; `apart` N pairs windows of N seasons that share none), then each family's share (DEFAULT_FAMILY_SHARES)
 * divided within the family by reliability and redundancy (redundancyWeights.ts, familyWeights.ts).
 * The one place the build (buildProfiles) and the backtest's replay as of a past season
 * (outlook/groupAsOf.ts) compute them.
 *
 * @example
 * // two identical perfectly reliable columns of one family share that family's weight equally
 */
export function defaultWeights(
  z: Float64Array, n: number, d: number, player: ArrayLike<number>, season: ArrayLike<number>, families: readonly SkillFamily[], apart = 1,
): { reliability: Float64Array; redundancy: Float64Array } {
  const rel = reliability(z, n, d, player, season, 30, 0.3, apart);
  const within = redundancyWeights(z, n, d, rel, 30, families.map((f) => SKILL_FAMILIES.indexOf(f)));
  return { reliability: rel, redundancy: familyWeights(families, within, DEFAULT_FAMILY_SHARES) };
}
