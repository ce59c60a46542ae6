import type { DistanceAttribution } from '../embed/attributeDistance.ts';
import type { DimensionInfo } from '../profiles/Dimension.ts';
import type { Explanation } from './explainComp.ts';

import { alikeApart } from './alikeApart.ts';

/**
 * The input-space breakdown of a comp (explainComp: values, grades, shares) with each dimension's
 * Shapley attribution of the embedded distance added. `alike` and `apart` follow the one rule of
 * alikeApart.ts on the grades shown, so they never contradict the grid: alike are close grades, the
 * dimensions the space responds to most first (the group's drivers: mean |attribution| over the
 * build's sample of comps); apart are wide grade gaps with the largest attributions.
 *
 * @example
 * // drivers obp 0.5, iso 0.4; grades obp 60 vs 61, iso 70 vs 45 (attribution 0.6): alike [obp], apart [iso]
 */
export function explainEmbeddedComp(
  ex: Explanation,
  attribution: DistanceAttribution,
  drivers: Float64Array,
  dims: readonly DimensionInfo[],
): Explanation {
  const value = (j: number): number => attribution.values[j] ?? 0;
  const shown = (j: number): boolean => ex.dimensions[j] !== undefined && !ex.dimensions[j]?.missing;
  const { alike, apart } = alikeApart({
    targetGrade: ex.dimensions.map((x, j) => (shown(j) ? x.target_grade : null)),
    compGrade: ex.dimensions.map((x, j) => (shown(j) ? x.comp_grade : null)),
    importance: (j) => drivers[j] ?? 0,
    size: value,
  });
  const name = (j: number): string => dims[j]?.name ?? '';
  return {
    dimensions: ex.dimensions.map((x, j) => ({ ...x, attribution: value(j) })),
    alike: alike.map(name),
    apart: apart.map(name),
  };
}
