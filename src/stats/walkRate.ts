/**
 * Walk rate (BB%) of a batter: walks per plate appearance.
 *
 * Source: common practice: BB% = BB / PA (intentional walks included).
 * Units: a fraction from 0 to 1 (not a percentage); higher is better for the batter.
 * Returns NaN when PA is 0.
 *
 * @example
 * walkRate(60, 600); // => 0.1
 */
export function walkRate(BB: number, PA: number): number {
  return PA === 0 ? NaN : BB / PA;
}
