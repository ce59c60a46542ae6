/**
 * The JSON contract of `kindred prospect`, `kindred cheaper` and `kindred match` (--format json).
 * Each extends the comps contract (src/query/types.ts) and, like it, only ever gains fields.
 */
import type { Comp, PoolEcho, QueryEcho } from '../query/types.ts';

export type OutcomeKind = 'hitter' | 'pitcher';

/** What one player did at the top level (MLB) in the seasons after one of his seasons. */
interface OutcomeBase {
  /** First and last season of the follow-up window (the season after, to `horizon` seasons after). */
  readonly window: readonly [number, number];
  /** Window seasons inside the data (less than the horizon when censored). */
  readonly seasons_observed: number;
  /** True when the window runs past the last season of the data: what happened next is not known. */
  readonly censored: boolean;
  /** At least one top-level line (PA or BF) in the window's observed seasons. */
  readonly reached_mlb: boolean;
  readonly first_mlb_season: number | null;
  /** Seasons in the window with a top-level line. */
  readonly mlb_seasons: number;
  /** Season of the peak value below (null when no season qualified). */
  readonly peak_season: number | null;
}

export interface HitterOutcome extends OutcomeBase {
  readonly kind: 'hitter';
  /** Best OPS+ in a top-level season of at least 300 PA in the window (null when none). */
  readonly peak_ops_plus: number | null;
}

export interface PitcherOutcome extends OutcomeBase {
  readonly kind: 'pitcher';
  /** Best (lowest) FIP- in a top-level season of at least 50 IP in the window (null when none). */
  readonly peak_fip_minus: number | null;
}

export type CompOutcome = HitterOutcome | PitcherOutcome;

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
  /** Weighted share who reached MLB in the window (0 to 1; null without comps). */
  readonly reached_mlb: number | null;
  /** MLB seasons played in the window, over every comp (0 for those who did not reach). */
  readonly mlb_seasons: SeasonsSummary;
}

/** Peak OPS+ (hitters) or best FIP- (pitchers) among those who had a qualifying MLB season. */
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

/** One aligned season of a --path comp. */
export interface PathStep {
  readonly season: number;
  readonly level: string;
  readonly age: number | null;
  readonly likeness: number;
  readonly coverage: number;
}

export interface ProspectComp extends Comp {
  /** The comp's follow-up is incomplete; listed only with --include-censored, never in the outlook. */
  readonly censored: boolean;
  readonly outcome: CompOutcome;
  /** With --path N: the N aligned seasons, the comp's season first. */
  readonly path?: readonly PathStep[];
}

export interface ProspectQueryEcho extends QueryEcho {
  readonly horizon_seasons: number;
  readonly path_seasons: number;
  readonly include_censored: boolean;
  /** The target's aligned seasons (his season first). */
  readonly path: readonly { readonly season: number; readonly level: string; readonly age: number | null }[];
}

export interface ProspectPoolEcho extends PoolEcho {
  /** The prospect rules on top of the filters. */
  readonly rules: {
    readonly level: string;
    readonly age_min: number;
    readonly age_max: number;
    /** Comp seasons are before this season. */
    readonly seasons_before: number;
    /** Comp seasons up to this one have a complete follow-up window. */
    readonly complete_window_to: number;
  };
  /** Eligible player-seasons with a complete follow-up window. */
  readonly complete_window: number;
  /** Eligible player-seasons whose follow-up is incomplete. */
  readonly censored: number;
}

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
export interface CalibratedOutlook {
  /** How the figures were made, in words (the pool, the probability map, the ranges). */
  readonly method: string;
  readonly reached_mlb: number;
  /** p10 / p50 / p90 of the peak OPS+ (hitters) or best FIP- (pitchers), adjusted to 80% coverage. */
  readonly peak: { readonly p10: number | null; readonly p50: number | null; readonly p90: number | null };
  readonly mlb_seasons: { readonly p10: number | null; readonly p50: number | null; readonly p90: number | null };
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

export interface ProspectResult {
  readonly query: ProspectQueryEcho;
  readonly pool: ProspectPoolEcho;
  readonly comps: readonly ProspectComp[];
  readonly outlook: Outlook & {
    /** Present when the store holds a backtest matching these settings (kindred build); else null with `calibration_note`. */
    readonly calibrated?: CalibratedOutlook | null;
    /** Why there is no calibrated outlook (null when there is one). */
    readonly calibration_note?: string | null;
  };
}

export interface CheaperComp extends Comp {
  readonly salary_usd: number;
  /** Likeness per million USD of salary. */
  readonly likeness_per_million: number;
  /** On the value frontier: no listed comp ranked above him (more alike) is paid as little or less. */
  readonly frontier: boolean;
}

export interface CheaperPoolEcho extends PoolEcho {
  readonly salary: {
    readonly rule: 'max-salary' | 'max-share';
    readonly limit_usd: number;
    /** The --max-share given (null with --max-salary). */
    readonly share: number | null;
    /** The target's salary in his season (null when unknown). */
    readonly target_salary_usd: number | null;
    /** Eligible player-seasons with a known salary under the limit. */
    readonly under_limit: number;
    /** Left out: a known salary above the limit. */
    readonly over_limit: number;
    /** Left out: no salary known (contracts.csv has no row for the player and season). */
    readonly without_salary: number;
    /** Distinct players among those without a salary. */
    readonly without_salary_players: number;
  };
}

export interface CheaperResult {
  readonly query: QueryEcho;
  readonly pool: CheaperPoolEcho;
  readonly comps: readonly CheaperComp[];
}

export interface MatchCandidate extends Comp {
  /** Share of the pool's players (one row each, his closest) less alike to the target, 0 to 100 (null for an empty pool). */
  readonly percentile: number | null;
  /** Pool players (other than the candidate) compared. */
  readonly pool_players: number;
  readonly more_alike: number;
  readonly less_alike: number;
  /** The candidate's season passes the pool filters. */
  readonly in_pool: boolean;
}

export interface MatchResult {
  readonly query: QueryEcho;
  readonly pool: PoolEcho;
  readonly candidate: MatchCandidate;
  /** The closest player in the pool, for reference (null when the pool is empty). */
  readonly closest: Comp | null;
}
