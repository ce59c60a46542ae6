/**
 * Home run rate (HR%) of a batter: home runs per plate appearance.
 *
 * Source: common practice: HR% = HR / PA.
 * Units: a fraction from 0 to 1 (not a percentage); higher is better for the batter.
 * Returns NaN when PA is 0.
 *
 * @example
 * homeRunRate(20, 500); // => 0.04
 */
export function homeRunRate(HR: number, PA: number): number {
  return PA === 0 ? NaN : HR / PA;
}
