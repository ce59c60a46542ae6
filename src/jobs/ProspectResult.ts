/** The JSON contract of `kindred prospect --format json`; extends the comps contract and only ever gains fields. */
import type { CompOutcome } from '../outlook/CompOutcome.ts';
import type { CalibratedOutlook, Outlook } from '../outlook/Outlook.ts';
import type { Comp, PoolEcho, QueryEcho } from '../query/CompsResult.ts';

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
  /** Comps at or below this likeness (two unrelated players, 100 / e) are left out. */
  readonly likeness_floor?: number;
  /** Pool player-seasons left out for it. */
  readonly below_likeness_floor?: number;
}

export interface ProspectResult {
  readonly query: ProspectQueryEcho;
  readonly pool: ProspectPoolEcho;
  readonly comps: readonly ProspectComp[];
  /** Cautions about the target, e.g. a player already established at the top level (empty when none). */
  readonly warnings?: readonly string[];
  readonly outlook: Outlook & {
    /** Present when the store holds a backtest matching these settings (kindred build); else null with `calibration_note`. */
    readonly calibrated?: CalibratedOutlook | null;
    /** Why there is no calibrated outlook (null when there is one). */
    readonly calibration_note?: string | null;
  };
}