/** Largest grade gap (20-80 points) that counts as alike: half a standard deviation (project rule). */
export const ALIKE_MAX_GAP = 5;
/** Smallest grade gap that can count as apart: one standard deviation (project rule). */
export const APART_MIN_GAP = 10;
/** Most names listed in `alike` and in `apart`. */
export const LISTED = 3;

export interface AlikeApartInput {
  /** Target's and comp's grade per dimension as shown (null when either side lacks it). */
  readonly targetGrade: readonly (number | null)[];
  readonly compGrade: readonly (number | null)[];
  /** How much a close match on the dimension tells (higher first in `alike`). */
  readonly importance: (j: number) => number;
  /** How much the dimension drives the distance (its share, or its attribution; larger first in `apart`). */
  readonly size: (j: number) => number;
}

/**
 * The one rule for `alike` and `apart`, in the CLI, the API and the page alike, so that neither can
 * contradict the grade grid shown beside it (project rule):
 * - alike: dimensions whose grades differ by at most ALIKE_MAX_GAP points, the most telling first, up
 *   to LISTED; never padded with wider gaps (a comp can be alike on nothing);
 * - apart: dimensions whose grades differ by at least APART_MIN_GAP points and that add to the
 *   distance, the largest share first, up to LISTED.
 * Gaps between the two are in neither list.
 *
 * @example
 * // OBP 72 vs 45 (gap 27, share 0.51), K% 54 vs 52 (gap 2, share 0.01), ISO 60 vs 48 (gap 12, share 0.3)
 * // => alike [K%], apart [OBP, ISO]
 */
export function alikeApart(input: AlikeApartInput): { alike: number[]; apart: number[] } {
  const gaps: { j: number; gap: number }[] = [];
  input.targetGrade.forEach((t, j) => {
    const c = input.compGrade[j];
    if (t !== null && t !== undefined && c !== null && c !== undefined) gaps.push({ j, gap: Math.abs(t - c) });
  });
  const alike = gaps
    .filter((x) => x.gap <= ALIKE_MAX_GAP)
    .sort((a, b) => input.importance(b.j) - input.importance(a.j) || a.gap - b.gap || a.j - b.j)
    .slice(0, LISTED)
    .map((x) => x.j);
  const apart = gaps
    .filter((x) => x.gap >= APART_MIN_GAP && input.size(x.j) > 0)
    .sort((a, b) => input.size(b.j) - input.size(a.j) || b.gap - a.gap || a.j - b.j)
    .slice(0, LISTED)
    .map((x) => x.j);
  return { alike, apart };
}
