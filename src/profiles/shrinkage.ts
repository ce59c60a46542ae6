import { kAt, pooledBetaBinomialMoments } from '../stats/betaBinomialMoments.ts';

/** How far rates are regressed toward their league: k fitted to the roster, or the fixed table. */
export interface ShrinkageOptions {
  /** Fit k per dimension and league stratum (season and level, plus position for fielding) when the data allow. */
  readonly fit: boolean;
  /** An era with fewer player-seasons (lines with at least one event) keeps the table's k. */
  readonly minPlayers: number;
  /** Seasons either side pooled into a stratum's era for the fit (same level, and position for fielding). */
  readonly eraSeasons: number;
  /** The table's k is its stabilisation sample times this (1 = the sample itself is k). */
  readonly tableScale: number;
}

/**
 * Fitting is off by default: on the standard bench leagues (bench/shrinkageQuality.bench.ts) fitted k did not beat
 * the table everywhere (nor the table everywhere fitted k); see README "Bench figures". Thresholds: an era needs
 * 100 player-seasons (lines with events) within 2 seasons either side of the stratum.
 */
export const DEFAULT_SHRINKAGE: ShrinkageOptions = { fit: false, minPlayers: 100, tableScale: 1, eraSeasons: 2 };

/** The k a dimension used in one league stratum, and where it came from. */
export interface ShrinkageUsed {
  readonly k: number;
  /** The table's k (stabilisation sample x tableScale). */
  readonly table: number;
  readonly source: 'fitted' | 'table';
  /** Players the fit rested on. */
  readonly players: number;
}

/** One league stratum's lines of a rate: successes and trials. */
export interface RateSample {
  readonly successes: ArrayLike<number>;
  readonly trials: ArrayLike<number>;
}

/**
 * The k of one league stratum of a rate: the talent variance fitted by the beta-binomial method of
 * moments over the stratum and its era (`samples`: the same level, and position for fielding, within
 * `eraSeasons` seasons either side, each about its own mean), then k = p(1 - p) / σ² - 1 at the
 * stratum's own league rate p. Fitted when the rate is binomial, fitting is on, the era has at least
 * `minPlayers` player-seasons and the fit shows a positive talent variance; otherwise the table's k.
 *
 * @example
 * shrinkageFor([{ successes: [1, 3, 5, 7], trials: [10, 10, 10, 10] }], 0.4, 60, true, { fit: true, minPlayers: 4, tableScale: 1, eraSeasons: 2 });
 * // => { k: 4.0625, table: 60, source: 'fitted', players: 4 }
 */
export function shrinkageFor(
  samples: readonly RateSample[],
  leagueRate: number,
  tableSample: number,
  binomial: boolean,
  options: ShrinkageOptions,
): ShrinkageUsed {
  const table = tableSample * options.tableScale;
  if (!options.fit || !binomial || tableSample <= 0) return { k: table, table, source: 'table', players: 0 };
  const fit = pooledBetaBinomialMoments(samples);
  const k = kAt(leagueRate, fit.talentVariance);
  if (fit.players < options.minPlayers || !(k > 0) || !Number.isFinite(k)) return { k: table, table, source: 'table', players: fit.players };
  return { k, table, source: 'fitted', players: fit.players };
}
