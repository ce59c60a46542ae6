/**
 * The roster as Kindred holds it after reading and checking the CSV files:
 * canonical names, numbers converted, innings in outs, stints combined.
 * A missing optional measurement is `undefined` (never zero).
 */
import type { InputIssue } from '../errors/InputError.ts';

export type Bats = 'L' | 'R' | 'S';
export type Throws = 'L' | 'R';
/** Fielding positions profiled by Kindred. */
export type FieldPosition = 'C' | '1B' | '2B' | '3B' | 'SS' | 'LF' | 'CF' | 'RF';
/** A season's position: a fielding position, DH for a hitter with no fielding, SP or RP for pitchers. */
export type Position = FieldPosition | 'DH' | 'SP' | 'RP';

export interface Player {
  readonly playerId: string;
  readonly name: string;
  /** YYYY-MM-DD */
  readonly birthDate?: string;
  readonly bats?: Bats;
  readonly throws?: Throws;
}

/** Key of a player-season at one level. */
export interface SeasonKey {
  readonly playerId: string;
  readonly season: number;
  readonly level: string;
}

/** Batting for one player, season and level, all stints combined. */
export interface BattingSeason extends SeasonKey {
  readonly teams: readonly string[];
  readonly G?: number;
  readonly PA: number;
  readonly AB: number;
  readonly H: number;
  readonly doubles: number;
  readonly triples: number;
  readonly HR: number;
  readonly BB: number;
  readonly HBP: number;
  readonly SF: number;
  readonly SO: number;
  readonly IBB?: number;
  readonly SB?: number;
  readonly CS?: number;
  /** Batted-ball events behind the batted-ball averages. */
  readonly bbe?: number;
  readonly evAvgMph?: number;
  readonly evP90Mph?: number;
  readonly laAvgDeg?: number;
  /** 0 to 100 */
  readonly hardHitPct?: number;
  /** 0 to 100 */
  readonly sweetSpotPct?: number;
  readonly sprintFtS?: number;
}

/** Fielding for one player, season, level and position, stints combined. */
export interface FieldingSeason extends SeasonKey {
  readonly pos: FieldPosition;
  readonly teams: readonly string[];
  readonly G?: number;
  /** Innings in outs (thirds): 6.2 innings is 20 outs. */
  readonly outs: number;
  readonly PO: number;
  readonly A: number;
  readonly E: number;
  readonly armMph?: number;
  readonly pop2bS?: number;
  readonly exchangeS?: number;
  readonly sbAgainst?: number;
  readonly csCaught?: number;
}

/** Pitching for one player, season and level, stints combined. */
export interface PitchingSeason extends SeasonKey {
  readonly teams: readonly string[];
  readonly G: number;
  readonly GS: number;
  /** Innings pitched in outs (thirds). */
  readonly outs: number;
  readonly BF: number;
  readonly H: number;
  readonly HR: number;
  readonly BB: number;
  readonly HBP: number;
  readonly SO: number;
  readonly ER: number;
  readonly fbMph?: number;
  readonly fbSpinRpm?: number;
  /** 0 to 100 */
  readonly whiffPct?: number;
  /** 0 to 100 */
  readonly gbPct?: number;
}

export interface Contract {
  readonly playerId: string;
  readonly season: number;
  readonly salaryUsd: number;
}

/** A row left out under --lenient, with every reason found in it. */
export interface RejectedRow {
  readonly file: string;
  readonly line: number;
  readonly raw: readonly string[];
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
}
