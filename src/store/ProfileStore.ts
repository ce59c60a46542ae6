import type { Bats, Position, Throws } from '../ingest/Roster.ts';
import type { DimensionInfo } from '../profiles/Dimension.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';
import type { StratumStats } from '../profiles/standardiseByStratum.ts';
import type { ShrinkageUsed } from '../profiles/shrinkage.ts';
import type { GuardedIndex } from '../ann/GuardedIndex.ts';
import type { Outcomes } from '../outlook/Outcomes.ts';
import type { OpenStore } from './openStore.ts';
import type { StoredEmbedding } from './StoredEmbedding.ts';

export interface StoredPlayer {
  readonly playerId: string;
  readonly name: string;
  readonly birthDate: string | null;
  readonly bats: Bats | null;
  readonly throws: Throws | null;
}

/** Rows that have the same dimensions, and the index on them (null when few enough to scan). */
export interface StoredPartition {
  /** Dimensions (column indices) of the index vectors. */
  readonly dims: Int32Array;
  /** Group rows; index label i is row rows[i]. */
  readonly rows: Int32Array;
  readonly index: GuardedIndex | null;
  /**
   * The narrow index (src/ann/narrowRows.ts): the rows of the wider partitions (`rows`, its labels)
   * on this partition's dimensions; null when the build made none.
   */
  readonly narrow: { readonly rows: Int32Array; readonly index: GuardedIndex | null } | null;
}

/** One position group as queries see it: columns of row metadata, the matrices, the index. */
export interface StoredGroup {
  readonly group: PositionGroup;
  readonly dims: readonly DimensionInfo[];
  readonly d: number;
  readonly n: number;
  /** Default dimension weights (reliability and redundancy; see src/profiles/redundancyWeights.ts). */
  readonly redundancy: Float64Array;
  /** Season-to-season reliability per dimension. */
  readonly reliability: Float64Array;
  readonly player: Int32Array;
  readonly season: Int32Array;
  readonly level: Int32Array;
  readonly position: readonly Position[];
  /** NaN without a birth date. */
  readonly age: Float64Array;
  readonly sample: Int32Array;
  /** Outs recorded (innings pitched in thirds) per row; NaN for hitter rows. */
  readonly outs: Float64Array;
  readonly teams: readonly string[];
  readonly raw: Float32Array;
  readonly z: Float32Array;
  /** Per dimension, `${season}|${level}|${scope}` to stats. */
  readonly strata: ReadonlyMap<string, ReadonlyMap<string, StratumStats>>;
  /** Per dimension, league stratum key (`season|level`, plus `|position` for fielding) to the k its rate was regressed with. */
  readonly shrinkage: ReadonlyMap<string, ReadonlyMap<string, ShrinkageUsed>>;
  /** The index over all rows on the codes of a learned space; null in the input space (see partitions). */
  readonly index: GuardedIndex | null;
  /** Input space: the rows by coverage pattern, each with its index (null: scanned). Empty with a learned space. */
  readonly partitions: readonly StoredPartition[];
  /** The learned space comps are ranked in, when the store was built with one (the index then holds its codes). */
  readonly embedding?: StoredEmbedding;
  /** Profiles over windows of several seasons: the seasons per window and each row's first season (its last is `season`). */
  readonly window?: { readonly size: number; readonly first: Int32Array };
}

/** A profile row: the group and the row in it. */
export interface StoredRowRef {
  readonly group: PositionGroup;
  readonly row: number;
}

/** A store opened for queries (openProfileStore): players, groups and, on demand, the outcomes. */
export interface ProfileStore {
  readonly dir: string;
  /** The verified store it was read from, for readers of further files (such as the backtest). */
  readonly opened: OpenStore;
  readonly params: Readonly<Record<string, unknown>>;
  readonly levels: readonly string[];
  readonly players: readonly StoredPlayer[];
  readonly playerById: ReadonlyMap<string, number>;
  /**
   * Every profile row of a player (by store index), in POSITION_GROUPS order and row order, from the
   * players table: only the player's own groups are read.
   */
  rowsOf(player: number): readonly StoredRowRef[];
  /** The same over windows of `size` seasons (the groups of `windows.get(size)`); none when the store has no such windows. */
  rowsOfWindow(size: number, player: number): readonly StoredRowRef[];
  /** Salary by player index and season. */
  readonly salaries: ReadonlyMap<number, ReadonlyMap<number, number>>;
  readonly groups: ReadonlyMap<PositionGroup, StoredGroup>;
  /** Profiles over windows of N >= 2 seasons, by N then group (built with `kindred build --windows`); see windowView. */
  readonly windows: ReadonlyMap<number, ReadonlyMap<PositionGroup, StoredGroup>>;
  /**
   * What every player did at the top level (outcomes.json), decoded on the first call. A store built
   * before outcomes were kept has none: StoreError `kindred.store.missing`, asking for a rebuild.
   */
  outcomes(): Outcomes;
}
