/** What one player did at the top level in the seasons after one of his seasons (outcomes.json, the outlooks). */

export type OutcomeKind = 'hitter' | 'pitcher';

/** What one player did at the top level (the roster's highest declared level) in the seasons after one of his seasons. */
interface OutcomeBase {
  /** First and last season of the follow-up window (the season after, to `horizon` seasons after). */
  readonly window: readonly [number, number];
  /** Window seasons inside the data (less than the horizon when censored). */
  readonly seasons_observed: number;
  /** True when the window runs past the last season of the data: what happened next is not known. */
  readonly censored: boolean;
  /** At least one top-level line (PA or BF) in the window's observed seasons. */
  readonly reached_top_level: boolean;
  /** His first season with a top-level line, up to the last season seen; may precede the window (he was already there). */
  readonly first_top_level_season: number | null;
  /** Seasons in the window with a top-level line. */
  readonly top_level_seasons: number;
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