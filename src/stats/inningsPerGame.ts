import type { Rate } from './Rate.ts';

/**
 * Innings per game (IP/G) of a pitcher: how long he works each time out.
 *
 * Source: common practice: IP / G. Innings are counted in outs (an integer): IP = outs / 3.
 * Units: innings per appearance; neither better nor worse (a starter's role shows as a high value).
 * `rateOf` gives NaN when G is 0.
 *
 * @example
 * rateOf(inningsPerGame, { outs: 540, G: 30 }); // => 180 / 30 = 6
 */
export const inningsPerGame: Rate<{ readonly outs: number; readonly G: number }> = {
  name: 'inningsPerGame',
  formula: 'IP / G',
  source: 'common practice',
  numerator: (c) => c.outs / 3,
  denominator: (c) => c.G,
};
