/**
 * Regression to the mean for an averaged measurement (e.g. average exit velocity over n batted balls):
 * weight the player's mean by n and the league mean by k.
 *
 * Source: common practice (the same shrinkage as `regressToMean`, for a mean instead of a count):
 * regressed = (mean * n + leagueMean * k) / (n + k). Take k from `stabilisationSample`.
 * Units: the measurement's own (e.g. mph); direction as the measurement's.
 * Returns NaN when n + k is 0.
 *
 * @param mean the player's mean over n measurements
 * @param n number of measurements behind the mean (e.g. batted-ball events)
 * @param leagueMean league mean of the measurement
 * @param k stabilisation sample, in the same unit as n
 * @example
 * regressAverageToMean(92, 30, 88, 50); // => (92 * 30 + 88 * 50) / 80 = 7160 / 80 = 89.5
 */
export function regressAverageToMean(mean: number, n: number, leagueMean: number, k: number): number {
  const total = n + k;
  return total === 0 ? NaN : (mean * n + leagueMean * k) / total;
}
