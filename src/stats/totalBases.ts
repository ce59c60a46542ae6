/**
 * Total bases (TB): bases gained on hits, one for a single up to four for a home run.
 *
 * Source: Official Baseball Rules, definition of total bases / slugging (rule 9.21, number from memory):
 * TB = 1B + 2 * 2B + 3 * 3B + 4 * HR. Written here from hits, since hits include every extra-base hit:
 * TB = H + 2B + 2 * 3B + 3 * HR.
 * Units: bases (a count); higher is better.
 *
 * @param H all hits (singles included)
 * @param doubles doubles
 * @param triples triples
 * @param HR home runs
 * @example
 * totalBases(150, 30, 3, 20); // => 150 + 30 + 6 + 60 = 246
 */
export function totalBases(H: number, doubles: number, triples: number, HR: number): number {
  return H + doubles + 2 * triples + 3 * HR;
}
