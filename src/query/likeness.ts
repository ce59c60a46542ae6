/**
 * Likeness, 0 to 100, from a missing-aware distance: 100 * exp(-d^2 / (2 W)), W the target's total
 * weight. A project choice: 100 means an identical profile; since two unrelated players differ by
 * about 2W in weighted squared distance (each standardised dimension has variance 1 on both sides),
 * an unrelated pair scores about 100 / e = 37. Strictly decreasing in the distance.
 *
 * @example
 * likeness(0, 5); // => 100
 * likeness(Math.sqrt(10), 5); // => 36.79 (100 / e)
 */
/**
 * The likeness of two unrelated players, 100 / e (about 36.8; see likeness): a comp at or below it
 * resembles the target no more than a player drawn at random does.
 */
export const UNRELATED_LIKENESS = 100 / Math.E;

export function likeness(distance: number, totalWeight: number): number {
  if (!(totalWeight > 0) || !Number.isFinite(distance)) return 0;
  return 100 * Math.exp(-(distance * distance) / (2 * totalWeight));
}
