/**
 * Method-of-moments fit of a beta-binomial: how much of the spread of players' rates is true talent
 * and how much is binomial sampling noise, and the regression constant k that follows.
 *
 * Model: player i has a true rate θ_i drawn from a distribution with mean μ and variance σ² (the talent
 * variance); he shows x_i successes in n_i trials, x_i | θ_i ~ Binomial(n_i, θ_i). With a beta prior of
 * mean μ and α + β = M, Var(θ) = μ(1 - μ) / (M + 1), and the posterior mean is (x + Mμ) / (n + M): the
 * league rate added M times. So k = M = μ(1 - μ) / σ² - 1, which is also the noise variance of one
 * trial, E[θ(1 - θ)] = μ(1 - μ) - σ², divided by the talent variance.
 *
 * Estimator (events-weighted moments): with p_i = x_i / n_i, W = Σ n_i, p̄ = Σ x_i / W and
 * S = Σ n_i (p_i - p̄)², E[S] = σ² (W - Σ n_i² / W - (N - 1)) + μ(1 - μ)(N - 1), so
 *   σ² = (S - (N - 1) p̄(1 - p̄)) / (W - Σ n_i² / W - (N - 1)).
 * With equal n this is the classical (s² - p̄(1 - p̄)/n) / (1 - 1/n): the observed between-player
 * variance minus the mean binomial noise variance, rescaled.
 *
 * Source (from memory): the beta-binomial moments and the method-of-moments fit as in Casella & Berger,
 * Statistical Inference (the beta-binomial hierarchy), and the weighted form for unequal n as in
 * Kleinman (1973), "Proportions with extraneous variance", JASA; derivation above re-done by hand.
 *
 * @example
 * // four players, 10 trials each, 1, 3, 5 and 7 successes: p̄ = 0.4, s² = 0.0667 (divisor N - 1),
 * // σ² = (0.0667 - 0.24 / 10) / (1 - 1/10) = 0.0474, k = 0.24 / 0.0474 - 1 = 4.06
 * betaBinomialMoments([1, 3, 5, 7], [10, 10, 10, 10]);
 */
export interface BetaBinomialFit {
  /** Players with at least one trial. */
  readonly players: number;
  /** Trials summed. */
  readonly trials: number;
  /** Pooled rate p̄ = Σx / Σn. */
  readonly mean: number;
  /** Estimated talent variance σ² (may come out zero or negative: then no talent spread is shown). */
  readonly talentVariance: number;
  /** Regression constant p̄(1 - p̄) / σ² - 1 in trials; NaN when σ² <= 0 or there are fewer than 2 players. */
  readonly k: number;
}

export function betaBinomialMoments(successes: ArrayLike<number>, trials: ArrayLike<number>): BetaBinomialFit {
  return pooledBetaBinomialMoments([{ successes, trials }]);
}

/**
 * The same fit over several samples (seasons of an era) that share one talent variance but each have
 * their own mean: S and the noise term are taken within each sample about its own p̄_s and summed,
 *   σ² = Σ_s (S_s - (N_s - 1) p̄_s(1 - p̄_s)) / Σ_s (W_s - Σ n_i² / W_s - (N_s - 1)),
 * so a drift of the league rate from season to season is not mistaken for talent. `mean` and `k` are
 * those of the pooled rate; a sample's own k is p̄_s(1 - p̄_s) / σ² - 1 (see `kAt`).
 */
export function pooledBetaBinomialMoments(samples: readonly { successes: ArrayLike<number>; trials: ArrayLike<number> }[]): BetaBinomialFit {
  let players = 0;
  let allTrials = 0;
  let allSuccesses = 0;
  let numerator = 0;
  let denominator = 0;
  for (const { successes, trials } of samples) {
    let N = 0;
    let W = 0;
    let X = 0;
    let n2 = 0;
    let x2n = 0;
    for (let i = 0; i < successes.length; i++) {
      const x = successes[i] as number;
      const n = trials[i] as number;
      if (!(n > 0) || !Number.isFinite(x)) continue;
      N++;
      W += n;
      X += x;
      n2 += n * n;
      x2n += (x * x) / n;
    }
    players += N;
    allTrials += W;
    allSuccesses += X;
    if (N < 2) continue;
    const p = X / W;
    numerator += x2n - W * p * p - (N - 1) * p * (1 - p);
    denominator += W - n2 / W - (N - 1);
  }
  const mean = allTrials > 0 ? allSuccesses / allTrials : NaN;
  const talentVariance = denominator > 0 ? numerator / denominator : NaN;
  return { players, trials: allTrials, mean, talentVariance, k: kAt(mean, talentVariance) };
}

/** The regression constant at league rate p for talent variance σ²: p(1 - p) / σ² - 1; NaN unless σ² > 0. */
export function kAt(p: number, talentVariance: number): number {
  return talentVariance > 0 ? (p * (1 - p)) / talentVariance - 1 : NaN;
}
