import { roundOrNull } from '../stats/round.ts';
import type { DimensionInfo } from '../profiles/Dimension.ts';
import { toGrade } from '../stats/toGrade.ts';
import type { DimensionDetail } from './CompsResult.ts';
import { alikeApart } from './alikeApart.ts';


export interface Explanation {
  readonly dimensions: DimensionDetail[];
  readonly alike: string[];
  readonly apart: string[];
}

const gradeOf = (z: number, dim: DimensionInfo): number | null =>
  Number.isNaN(z) ? null : toGrade(z, dim.direction);

/**
 * Per-dimension breakdown of one comp: natural values (observed), grades (from the regressed,
 * standardised values), and each dimension's share of the weighted squared distance (the shares of
 * the dimensions in play sum to 1; when the profiles are identical the shares follow the weights).
 * `alike` and `apart` follow the one rule of alikeApart.ts on the grades shown: alike are close grades,
 * heaviest weight first, a match away from the average counting more (score w * (1 + |mean of the two
 * z-scores|): two catchers who both throw far better than average are more alike in a telling way than
 * two average throwers); apart are wide grade gaps with the largest shares.
 */
export function explainComp(
  dims: readonly DimensionInfo[],
  weights: Float64Array,
  targetZ: Float64Array | Float32Array,
  targetRaw: Float64Array | Float32Array,
  compZ: Float32Array,
  compRaw: Float32Array,
  offset: number,
): Explanation {
  const d = dims.length;
  const parts = new Float64Array(d);
  const inPlay: boolean[] = [];
  let total = 0;
  let weightInPlay = 0;
  for (let j = 0; j < d; j++) {
    const t = targetZ[j] as number;
    const c = compZ[offset + j] as number;
    const w = weights[j] as number;
    const ok = !Number.isNaN(t) && !Number.isNaN(c) && w > 0;
    inPlay.push(ok);
    if (!ok) continue;
    parts[j] = w * (t - c) * (t - c);
    total += parts[j] as number;
    weightInPlay += w;
  }
  const side = targetSide(dims, targetZ, targetRaw);
  const dimensions: DimensionDetail[] = dims.map((dim, j) => {
    const c = compZ[offset + j] as number;
    const share = !inPlay[j] ? 0 : total > 0 ? (parts[j] as number) / total : (weights[j] as number) / weightInPlay;
    return {
      name: dim.name,
      target: side.values[j] ?? null,
      comp: roundOrNull(compRaw[offset + j] ?? NaN, dim.digits + 1),
      target_grade: side.grades[j] ?? null,
      comp_grade: gradeOf(c, dim),
      share,
      missing: !inPlay[j],
    };
  });
  const telling = (j: number): number => (weights[j] as number) * (1 + Math.abs(((targetZ[j] as number) + (compZ[offset + j] as number)) / 2));
  const { alike: alikeIdx, apart: apartIdx } = alikeApart({
    targetGrade: dimensions.map((x, j) => (inPlay[j] ? x.target_grade : null)),
    compGrade: dimensions.map((x, j) => (inPlay[j] ? x.comp_grade : null)),
    importance: telling,
    size: (j) => parts[j] as number,
  });
  const name = (j: number): string => (dims[j] as DimensionInfo).name;
  return { dimensions, alike: alikeIdx.map(name), apart: apartIdx.map(name) };
}

interface TargetSide {
  readonly dims: readonly DimensionInfo[];
  /** Copies of the target's values the side was computed from (an array changed in place is computed again). */
  readonly z: Float64Array;
  readonly raw: Float64Array;
  /** The target's shown value and grade per dimension (the same for every comp of a query). */
  readonly values: readonly (number | null)[];
  readonly grades: readonly (number | null)[];
}

const targetSides = new WeakMap<Float64Array | Float32Array, TargetSide>();

const sameValues = (a: Float64Array, b: Float64Array | Float32Array): boolean => {
  if (a.length !== b.length) return false;
  for (let j = 0; j < a.length; j++) if (!Object.is(a[j], b[j])) return false;
  return true;
};

/** The target's half of the breakdown, computed once per target (a query describes k comps of one target). */
function targetSide(dims: readonly DimensionInfo[], targetZ: Float64Array | Float32Array, targetRaw: Float64Array | Float32Array): TargetSide {
  const kept = targetSides.get(targetZ);
  if (kept && kept.dims === dims && sameValues(kept.z, targetZ) && sameValues(kept.raw, targetRaw)) return kept;
  const side: TargetSide = {
    dims,
    z: Float64Array.from(targetZ),
    raw: Float64Array.from(targetRaw),
    values: dims.map((dim, j) => roundOrNull(targetRaw[j] ?? NaN, dim.digits + 1)),
    grades: dims.map((dim, j) => gradeOf(targetZ[j] as number, dim)),
  };
  targetSides.set(targetZ, side);
  return side;
}
