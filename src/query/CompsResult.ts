/**
 * The JSON contract of `kindred comps --format json` (and of the HTTP API).
 * Stable: fields are only ever added, never renamed or removed.
 */
import type { Position } from '../ingest/Roster.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';

/** One dimension of one comp: the target's and the comp's value and how much it drove the distance. */
export interface DimensionDetail {
  /** Dimension name, e.g. `obp`, `pop_2b_s`. */
  readonly name: string;
  /** Target's value in natural units (null when the target lacks it). */
  readonly target: number | null;
  /** Comp's value in natural units (null when the comp lacks it). */
  readonly comp: number | null;
  /** Target's grade on the 20 to 80 scale, direction applied (higher is better). */
  readonly target_grade: number | null;
  readonly comp_grade: number | null;
  /** Share of the weighted squared distance (the shares of a comp sum to 1; 0 when missing). */
  readonly share: number;
  /** True when either side lacks the dimension, so it did not count. */
  readonly missing: boolean;
  /** Shapley attribution of the embedded distance (present only when the store has an embedding). */
  readonly attribution?: number;
}

export interface Comp {
  readonly rank: number;
  readonly player_id: string;
  readonly name: string;
  readonly season: number;
  /** With `--window N` (N >= 2): the first and last season the comp's window holds (the last is `season`). */
  readonly seasons?: readonly [number, number];
  readonly level: string;
  readonly position: Position;
  readonly age: number | null;
  /** Playing time of the comp's season (of his window with `--window`): plate appearances (hitters) or batters faced (pitchers). */
  readonly sample: number;
  readonly sample_unit: 'PA' | 'BF';
  /** Innings pitched in the comp's season, in the trade's thirds notation ("123.1" is 123 1/3); null for hitters. */
  readonly ip: string | null;
  /** 0 to 100, 100 for an identical profile; 100 * exp(-distance^2 / (2 * W)), W the total weight in play. */
  readonly likeness: number;
  readonly distance: number;
  /** Share of the target's weighted dimensions that the comp also has (0 to 1). */
  readonly coverage: number;
  readonly dimensions: readonly DimensionDetail[];
  /** Up to three heaviest-weighted dimensions that match closely. */
  readonly alike: readonly string[];
  /** Up to three dimensions with the largest differences. */
  readonly apart: readonly string[];
  /** The embedded distance the attributions add up to (only with an embedding). */
  readonly attribution_total?: number;
}

export interface QueryEcho {
  /** `player` for an existing player-season, `want` for a hand-built profile. */
  readonly kind: 'player' | 'want';
  readonly player_id: string | null;
  readonly name: string | null;
  readonly season: number | null;
  /** With `--window N` (N >= 2): the seasons per window, and the first and last season the target's window holds. */
  readonly window?: number;
  readonly seasons?: readonly [number, number];
  readonly level: string | null;
  readonly position: Position;
  readonly group: PositionGroup;
  readonly age: number | null;
  /** The target's dimensions in natural units (only those it has). */
  readonly profile: Readonly<Record<string, number>>;
  readonly k: number;
  readonly method: 'hnsw' | 'exact';
  readonly space: 'input' | 'pca' | 'autoencoder';
  /** Why a group with a learned space was answered in the input space (other weights than the default); absent otherwise. */
  readonly space_note?: string;
}

export interface PoolEcho {
  /** Player-seasons in the position group before filters. */
  readonly group_size: number;
  /** Player-seasons left after the filters. */
  readonly eligible: number;
  readonly filters: Readonly<Record<string, string | number | readonly string[]>>;
  /** Weight per dimension in play (any scale; only ratios matter). */
  readonly weights: Readonly<Record<string, number>>;
  /** The weighting preset asked for (`balanced` by default). */
  readonly preset: string;
  /** Share of the total weight each skill family holds (sums to 1), e.g. `{ "discipline": 0.2, ... }`. */
  readonly family_shares: Readonly<Record<string, number>>;
  /**
   * The playing-time floor (also `filters.min_sample`) and what it was scaled to: `share` of the target's
   * PA or BF (of the group's median season for a hand-built profile); null without a floor.
   */
  readonly sample_floor: {
    readonly unit: 'PA' | 'BF';
    readonly min: number;
    readonly share: number;
    readonly target_sample: number;
    readonly target_sample_from: 'target' | 'group median';
  } | null;
  /** The pool in words, e.g. "SS at AA, AAA, top level; seasons of 250 PA or more (half the target's 500)". */
  readonly summary: string;
}

export interface CompsResult {
  readonly query: QueryEcho;
  readonly pool: PoolEcho;
  readonly comps: readonly Comp[];
}
