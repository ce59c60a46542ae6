/**
 * The roster as Kindred holds it after reading and checking the CSV files:
 * canonical names, numbers converted, innings in outs, stints combined.
 * A missing optional measurement is absent (never zero). The record types
 * follow from the column tables (`*Columns.ts`).
 */
import type { InputIssue } from '../errors/InputError.ts';
import type { BATTING_COLUMNS } from './battingColumns.ts';
import type { RecordOf } from './ColumnSpec.ts';
import type { CONTRACTS_COLUMNS } from './contractsColumns.ts';
import type { FIELD_POSITIONS, FIELDING_COLUMNS } from './fieldingColumns.ts';
import type { PITCHING_COLUMNS } from './pitchingColumns.ts';
import type { BATS, PLAYERS_COLUMNS, THROWS } from './playersColumns.ts';

export type Bats = (typeof BATS)[number];
export type Throws = (typeof THROWS)[number];
/** Fielding positions profiled by Kindred. */
export type FieldPosition = (typeof FIELD_POSITIONS)[number];
/** A season's position: a fielding position, DH for a hitter with no fielding, SP or RP for pitchers. */
export type Position = FieldPosition | 'DH' | 'SP' | 'RP';

/** A player of players.csv (see playersColumns.ts). */
export type Player = RecordOf<typeof PLAYERS_COLUMNS>;

/** Key of a player-season at one level. */
export interface SeasonKey {
  readonly playerId: string;
  readonly season: number;
  readonly level: string;
}

/** Batting for one player, season and level, all stints combined (fields: battingColumns.ts). */
export type BattingSeason = RecordOf<typeof BATTING_COLUMNS>;

/** Fielding for one player, season, level and position, stints combined; innings in outs (fieldingColumns.ts). */
export type FieldingSeason = RecordOf<typeof FIELDING_COLUMNS>;

/** Pitching for one player, season and level, stints combined; innings in outs (pitchingColumns.ts). */
export type PitchingSeason = RecordOf<typeof PITCHING_COLUMNS>;

/** A row of contracts.csv (contractsColumns.ts). */
export type Contract = RecordOf<typeof CONTRACTS_COLUMNS>;

/** A row left out under --lenient, with every reason found in it. */
export interface RejectedRow {
  readonly file: string;
  readonly line: number;
  /** The row's first cells (at most REJECTED_CELLS_KEPT, each cut to REJECTED_CELL_CHARS characters). */
  readonly raw: readonly string[];
  /** How many cells the row had. */
  readonly rawCells: number;
  readonly issues: readonly InputIssue[];
}

export interface Roster {
  readonly players: ReadonlyMap<string, Player>;
  readonly batting: readonly BattingSeason[];
  readonly fielding: readonly FieldingSeason[];
  readonly pitching: readonly PitchingSeason[];
  readonly contracts: readonly Contract[];
  /** Levels from lowest to highest. */
  readonly levels: readonly string[];
  /** Data rows read per file (header excluded). */
  readonly rowsRead: Readonly<Record<string, number>>;
  readonly rejected: readonly RejectedRow[];
  /** Columns read past because no canonical column maps to them, per file name as read (files with none omitted). */
  readonly ignoredColumns: Readonly<Record<string, readonly string[]>>;
  /** fielding.csv rows at position P: checked like the others, then left out (pitchers' fielding is not profiled). */
  readonly pitcherFieldingRows: number;
  /** Position groups the files leave empty, in words (e.g. no fielding.csv: every hitter a DH). */
  readonly notices: readonly string[];
}
