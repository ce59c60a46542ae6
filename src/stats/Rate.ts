/**
 * A rate written once: its numerator and denominator over a line of counts, with its formula and
 * source. The scalar value (`rateOf`), the league rate (`pooledRate`) and the profile dimension
 * (src/profiles/rateMeasure.ts) all come from the same two functions.
 *
 * @example
 * const kRate: Rate<{ SO: number; PA: number }> = {
 *   name: 'strikeoutRate', formula: 'SO / PA', source: 'common practice',
 *   numerator: (c) => c.SO, denominator: (c) => c.PA,
 * };
 * rateOf(kRate, { SO: 27, PA: 108 }); // => 0.25
 * pooledRate(kRate, [{ SO: 10, PA: 100 }, { SO: 30, PA: 100 }]); // => 40 / 200 = 0.2
 */
export interface Rate<C> {
  /** The module the rate lives in (src/stats/<name>.ts); also its key in STABILISATION when regressed. */
  readonly name: string;
  /** The formula in the trade's abbreviations, e.g. 'SO / PA'. */
  readonly formula: string;
  /** Where the formula comes from ("Official Baseball Rules ...", "common practice"). */
  readonly source: string;
  readonly numerator: (counts: C) => number;
  readonly denominator: (counts: C) => number;
}

/** The rate of one line of counts; NaN when the denominator is 0. */
export function rateOf<C>(rate: Rate<C>, counts: C): number {
  const den = rate.denominator(counts);
  return den === 0 ? NaN : rate.numerator(counts) / den;
}

/**
 * The rate of lines taken together: the sum of numerators over the sum of denominators (a league's
 * rate from its totals, not the mean of its players' rates). NaN when the denominators sum to 0.
 */
export function pooledRate<C>(rate: Rate<C>, lines: Iterable<C>): number {
  let num = 0;
  let den = 0;
  for (const c of lines) {
    num += rate.numerator(c);
    den += rate.denominator(c);
  }
  return den === 0 ? NaN : num / den;
}
