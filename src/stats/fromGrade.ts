import type { Direction } from './Direction.ts';

/** Average grade and grade points per standard deviation (as in `toGrade`). */
const GRADE_MEAN = 50;
const GRADE_PER_SD = 10;

/**
 * z-score from a scouting grade on the 20 to 80 scale: the inverse of `toGrade` before its rounding and
 * clamping (so grades outside 20..80 are accepted and not clamped, and nothing is rounded).
 *
 * Source: common practice: z = (grade - 50) / 10 for higher-is-better, (50 - grade) / 10 for
 * lower-is-better measurements; `neither` as higher-is-better (as in `toGrade`).
 * Units: standard deviations of the raw measurement; sign follows the raw measurement (for a
 * lower-is-better measurement a high grade gives a negative z).
 *
 * @example
 * fromGrade(65, 'higher'); // => 1.5
 * fromGrade(65, 'lower'); // => -1.5
 */
export function fromGrade(grade: number, direction: Direction): number {
  const oriented = (grade - GRADE_MEAN) / GRADE_PER_SD;
  return direction === 'lower' ? -oriented : oriented;
}
