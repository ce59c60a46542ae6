/**
 * Brier score: the mean squared difference between forecast probabilities and what happened (1 or 0).
 *
 * Source: Brier (1950), "Verification of forecasts expressed in terms of probability", Monthly Weather
 * Review 78(1): BS = (1/N) sum (f_i - o_i)^2.
 * Units: 0 to 1; lower is better (0 is a perfect forecast; always saying 0.5 scores 0.25).
 * Pairs with a NaN forecast are left out. Returns NaN when no pair is left.
 *
 * @example
 * brierScore([0.9, 0.2, 0.5], [true, false, false]); // => (0.01 + 0.04 + 0.25) / 3 = 0.1
 */
export function brierScore(forecasts: readonly number[], outcomes: readonly boolean[]): number {
  if (forecasts.length !== outcomes.length) throw new RangeError(`brierScore: ${forecasts.length} forecasts but ${outcomes.length} outcomes`);
  let sum = 0;
  let n = 0;
  for (let i = 0; i < forecasts.length; i++) {
    const f = forecasts[i] as number;
    if (Number.isNaN(f)) continue;
    const o = outcomes[i] ? 1 : 0;
    sum += (f - o) * (f - o);
    n++;
  }
  return n === 0 ? NaN : sum / n;
}
