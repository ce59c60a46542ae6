import type { Rate } from './Rate.ts';
import type { HitCounts } from './totalBases.ts';

/**
 * Stolen-base attempt rate: steal attempts per time reaching first base.
 *
 * Source: common practice approximation: (SB + CS) / (1B + BB + HBP), taking singles
 * (H - 2B - 3B - HR), walks and hit-by-pitches as the times on first that give a chance to steal
 * (reaching on error or a fielder's choice is not counted; steals of third and home count as attempts).
 * Units: attempts per opportunity, usually 0 to 1 (can exceed 1 for runners who steal twice);
 * higher means more aggressive (neither better nor worse by itself).
 * `rateOf` gives NaN when 1B + BB + HBP is 0.
 *
 * @example
 * rateOf(stolenBaseAttemptRate, { SB: 30, CS: 10, H: 130, doubles: 25, triples: 3, HR: 5, BB: 60, HBP: 3 });
 * // => 40 / (97 + 60 + 3) = 40 / 160 = 0.25
 */
export const stolenBaseAttemptRate: Rate<
  HitCounts & { readonly SB: number; readonly CS: number; readonly BB: number; readonly HBP: number }
> = {
  name: 'stolenBaseAttemptRate',
  formula: '(SB + CS) / (1B + BB + HBP)',
  source: 'common practice approximation',
  numerator: (c) => c.SB + c.CS,
  denominator: (c) => c.H - c.doubles - c.triples - c.HR + c.BB + c.HBP,
};
