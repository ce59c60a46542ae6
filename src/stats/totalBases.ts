/** Hits of a line by kind: all hits, and the extra-base hits among them. */
export interface HitCounts {
  /** All hits (singles included). */
  readonly H: number;
  readonly doubles: number;
  readonly triples: number;
  readonly HR: number;
}

/**
 * Total bases (TB): bases gained on hits, one for a single up to four for a home run.
 *
 * Source: Official Baseball Rules, definition of total bases / slugging (rule 9.21, number from memory):
 * TB = 1B + 2 * 2B + 3 * 3B + 4 * HR. Written here from hits, since hits include every extra-base hit:
 * TB = H + 2B + 2 * 3B + 3 * HR.
 * Units: bases (a count); higher is better.
 *
 * @example
 * totalBases({ H: 150, doubles: 30, triples: 3, HR: 20 }); // => 150 + 30 + 6 + 60 = 246
 */
export function totalBases(c: HitCounts): number {
  return c.H + c.doubles + 2 * c.triples + 3 * c.HR;
}
