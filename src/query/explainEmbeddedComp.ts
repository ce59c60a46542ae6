import type { DistanceAttribution } from '../embed/attributeDistance.ts';
import type { DimensionInfo } from '../profiles/Dimension.ts';
import type { Explanation } from './explainComp.ts';

/** Most names listed in `alike` and in `apart`. */
const LISTED = 3;

/**
 * The input-space breakdown of a comp (explainComp: values, grades, shares) with each dimension's
 * Shapley attribution of the embedded distance added, and `alike` / `apart` chosen from the
 * attributions instead of the input-space differences (a project rule):
 * - in play: dimensions present on both sides;
 * - apart: up to three whose attribution exceeds an even share of the distance (total / number in
 *   play), largest first: what moves the comp away most;
 * - alike: among the heavier half of the dimensions in play, ranked by the group's drivers (mean
 *   |attribution| over the build's sample of comps, so the dimensions the space actually responds to),
 *   up to three with the smallest |attribution| (heavier first on ties), leaving out those in apart;
 *   if that gives fewer than three, the rest of the dimensions in play follow by smallest |attribution|.
 *
 * @example
 * // drivers obp 0.5, iso 0.4, k_pct 0.1; attributions obp 0.01, iso 0.6, k_pct 0.02 (total 0.63):
 * // even share 0.21, so apart = [iso]; heavier half = {obp, iso}, less iso = [obp]; then k_pct:
 * // alike = [obp, k_pct]
 */
export function explainEmbeddedComp(
  ex: Explanation,
  attribution: DistanceAttribution,
  drivers: Float64Array,
  dims: readonly DimensionInfo[],
): Explanation {
  const d = dims.length;
  const value = (j: number): number => attribution.values[j] ?? 0;
  const inPlay: number[] = [];
  for (let j = 0; j < d; j++) if (ex.dimensions[j] && !ex.dimensions[j]?.missing) inPlay.push(j);
  const evenShare = inPlay.length > 0 ? attribution.total / inPlay.length : 0;
  const apartIdx = inPlay
    .filter((j) => value(j) > 0 && value(j) > evenShare)
    .sort((a, b) => value(b) - value(a) || a - b)
    .slice(0, LISTED);
  const weight = (j: number): number => drivers[j] ?? 0;
  const byWeight = [...inPlay].sort((a, b) => weight(b) - weight(a) || a - b);
  const heavy = byWeight.slice(0, Math.ceil(byWeight.length / 2));
  const calm = (list: number[]): number[] =>
    list.filter((j) => !apartIdx.includes(j)).sort((a, b) => Math.abs(value(a)) - Math.abs(value(b)) || weight(b) - weight(a) || a - b);
  const alikeIdx = calm(heavy).slice(0, LISTED);
  if (alikeIdx.length < LISTED) {
    for (const j of calm(inPlay)) {
      if (alikeIdx.length >= LISTED) break;
      if (!alikeIdx.includes(j)) alikeIdx.push(j);
    }
  }
  const name = (j: number): string => dims[j]?.name ?? '';
  return {
    dimensions: ex.dimensions.map((x, j) => ({ ...x, attribution: value(j) })),
    alike: alikeIdx.map(name),
    apart: apartIdx.map(name),
  };
}
