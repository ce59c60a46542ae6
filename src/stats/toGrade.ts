import type { Direction } from './Direction.ts';

/** Lowest and highest grades of the scouting scale. */
const GRADE_MIN = 20;
const GRADE_MAX = 80;
/** Average grade and grade points per standard deviation. */
const GRADE_MEAN = 50;
const GRADE_PER_SD = 10;

/**
 * Scouting grade on the 20 to 80 scale from a z-score: 50 is average, each 10 points one standard
 * deviation, oriented so a higher grade is always better.
 *
 * Source: common practice: grade = 50 + 10 * z for higher-is-better measurements, 50 - 10 * z for
 * lower-is-better ones, clamped to 20..80. A `neither` measurement (a style, such as launch angle) is
 * graded like a higher-is-better one: a high grade is a high value.
 * Rounding: the result is rounded to the nearest integer with Math.round (halves go up: 44.5 -> 45),
 * then clamped.
 * Units: grade points, integer 20 to 80; higher is better. NaN in gives NaN out.
 *
 * @param z standard score of the measurement
 * @param direction whether a higher raw value is better (`lower` flips the scale)
 * @example
 * toGrade(1.26, 'higher'); // => 63 (62.6 rounded)
 * toGrade(1.26, 'lower'); // => 37 (37.4 rounded)
 * toGrade(4, 'higher'); // => 80 (clamped)
 */
export function toGrade(z: number, direction: Direction): number {
  const oriented = direction === 'lower' ? -z : z;
  const grade = Math.round(GRADE_MEAN + GRADE_PER_SD * oriented);
  return Math.min(GRADE_MAX, Math.max(GRADE_MIN, grade));
}
