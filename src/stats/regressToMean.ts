/**
 * Regression to the mean for a rate (stabilisation shrinkage): add k league-average events to the
 * player's own, so a small sample is pulled toward the league rate and a large one keeps its own.
 *
 * Source: common practice (beta-binomial shrinkage with a prior worth k trials):
 * regressed = (successes + k * leagueRate) / (trials + k). With trials = k the result sits halfway
 * between the observed and the league rate; take k from `stabilisationSample`.
 * Units: the rate's own (a fraction per trial); direction as the rate's.
 * Returns NaN when trials + k is 0.
 *
 * @param successes events observed (e.g. strikeouts)
 * @param trials opportunities observed (e.g. plate appearances)
 * @param leagueRate league rate per trial
 * @param k stabilisation sample, in the same unit as trials
 * @example
 * regressToMean(30, 100, 0.2, 60); // => (30 + 60 * 0.2) / (100 + 60) = 42 / 160 = 0.2625
 */
export function regressToMean(successes: number, trials: number, leagueRate: number, k: number): number {
  const total = trials + k;
  return total === 0 ? NaN : (successes + k * leagueRate) / total;
}
