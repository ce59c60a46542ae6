/** The prospect outlook: what the comps became, the base rate beside it, and its calibration on this roster. */

/** Weighted p10, p50 and p90 of a distribution (see weightedQuantile), with the count behind them. */
export interface QuantileSummary {
  /** Values the distribution was drawn from. */
  readonly n: number;
  readonly p10: number | null;
  readonly p50: number | null;
  readonly p90: number | null;
}

export interface SeasonsSummary extends QuantileSummary {
  /** Weighted mean. */
  readonly mean: number | null;
}

interface FiguresBase {
  /** Weighted share who reached the top level in the window (0 to 1; null without comps). */
  readonly reached_top_level: number | null;
  /** Top-level seasons played in the window, over every comp (0 for those who did not reach). */
  readonly top_level_seasons: SeasonsSummary;
}

/** Peak OPS+ (hitters) or best FIP- (pitchers) among those who had a qualifying top-level season. */
export type PeakFigures = { readonly peak_ops_plus: QuantileSummary } | { readonly peak_fip_minus: QuantileSummary };

export type OutlookFigures = FiguresBase & PeakFigures;

/** The level-and-age base rate: every complete-window player-season of the pool, unweighted. */
export type BaselineFigures = OutlookFigures & { readonly player_seasons: number };

export type Outlook = OutlookFigures & {
  readonly horizon_seasons: number;
  /** Last season whose outcomes were used (the data's last season unless a cut-off was set). */
  readonly as_of_season: number;
  /** Comps the outlook is drawn from (their windows are complete). */
  readonly comps_used: number;
  /** Players who would have been among the comps but whose follow-up is incomplete (censored). */
  readonly comps_censored: number;
  /** Kish's effective number of comps, (sum w)^2 / sum w^2 over their likeness weights. */
  readonly comps_effective: number;
  readonly baseline: BaselineFigures;
};

/** A figure of the roster's backtest with its 95% bootstrap interval. */
export interface BacktestFigure {
  readonly value: number | null;
  readonly low: number | null;
  readonly high: number | null;
}

/**
 * The outlook calibrated on this roster's own history (kindred build's backtest): the probability from
 * the fitted map, the ranges adjusted by split conformal prediction, and how outlooks like this fared
 * when replayed at past cut seasons.
 */
/** A calibrated p10 / p50 / p90 with the coverage its kind of range achieved in the backtest. */
export interface CalibratedRange {
  readonly p10: number | null;
  readonly p50: number | null;
  readonly p90: number | null;
  readonly coverage: number | null;
}

export interface CalibratedOutlook {
  /** How the figures were made, in words (the pool, the probability map, the ranges). */
  readonly method: string;
  readonly reached_top_level: number;
  /** The share of outcomes each calibrated range is meant to hold (0.8: from p10 to p90). */
  readonly range_coverage: number;
  /**
   * p10 / p50 / p90 of the peak OPS+ (hitters) or best FIP- (pitchers), adjusted to 80% coverage, and
   * `coverage`: the share of realised values such ranges held in the backtest (null without one).
   */
  readonly peak: CalibratedRange;
  readonly top_level_seasons: CalibratedRange;
  /** On this roster, replayed at past cuts with only what was known then. */
  readonly backtest: {
    readonly cuts: readonly number[];
    readonly targets: number;
    readonly reached_share: number | null;
    readonly brier: number | null;
    readonly skill_vs_level_age: BacktestFigure;
    readonly reliability: number | null;
    readonly resolution: number | null;
    readonly spearman_peak: BacktestFigure;
    readonly peak_coverage: BacktestFigure;
    readonly seasons_coverage: BacktestFigure;
  };
}