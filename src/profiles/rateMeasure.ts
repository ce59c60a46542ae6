import type { Measure } from './Dimension.ts';
import type { Rate } from '../stats/Rate.ts';

/**
 * A dimension's measure from a rate in src/stats: the rate's own numerator and denominator, read
 * from the counts a line carries (undefined when the line lacks them, e.g. no fielding row or no
 * steal columns), regressed by `stabilisation` league-average events (0 = not regressed).
 * `binomial`: each event of the denominator is a success or not (K%, OBP), so k may be fitted to the
 * roster; pass false for rates that are not a share of their events (TB / AB, chances per nine innings).
 *
 * @example
 * rateMeasure(walkRate, (l: HitterLine) => l.batting, 120);
 * // a line with 60 BB in 600 PA measures numerator 60, denominator 600
 */
export function rateMeasure<L, C>(
  rate: Rate<C>,
  counts: (line: L) => C | undefined,
  stabilisation: number,
  binomial = true,
): Measure<L> {
  return {
    kind: 'rate',
    binomial,
    numerator: (line) => {
      const c = counts(line);
      return c === undefined ? undefined : rate.numerator(c);
    },
    denominator: (line) => {
      const c = counts(line);
      return c === undefined ? undefined : rate.denominator(c);
    },
    stabilisation,
  };
}

/** The source text a rate dimension shows: its module, formula and where the formula comes from. */
export function rateSource<C>(rate: Rate<C>): string {
  return `src/stats/${rate.name}.ts: ${rate.formula} (${rate.source})`;
}
