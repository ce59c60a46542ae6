/**
 * On-base plus slugging (OPS): the sum of on-base percentage and slugging percentage.
 *
 * Source: common practice: OPS = OBP + SLG.
 * Units: a number from 0 to 5 (no unit of its own); higher is better.
 * NaN in either input gives NaN.
 *
 * @example
 * ops(0.35, 0.45); // => 0.8
 */
export function ops(OBP: number, SLG: number): number {
  return OBP + SLG;
}
