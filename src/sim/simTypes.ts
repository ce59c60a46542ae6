/** Options and result of simulateLeague. */
import type { Bats, Throws } from '../ingest/Roster.ts';
import type { ColumnTable } from './ColumnTable.ts';
import type { SimTruth } from './SimTruth.ts';

/** First season from which each measured column is recorded (missing before). */
export interface MeasuredFrom {
  /** bbe, ev_avg_mph, ev_p90_mph, la_avg_deg, hard_hit_pct, la_band_pct (default lastSeason - 9). */
  readonly battedBall: number;
  /** run_speed_ft_s (default lastSeason - 9). */
  readonly sprint: number;
  /** arm_mph (default lastSeason - 7). */
  readonly arm: number;
  /** pop_2b_s and exchange_s (default lastSeason - 7). */
  readonly catcherTiming: number;
  /** fb_mph, fb_spin_rpm, whiff_pct (default lastSeason - 9). */
  readonly pitchTracking: number;
  /** gb_pct, recorded at every level (default lastSeason - 15). */
  readonly groundball: number;
}

export interface SimOptions {
  readonly seed: number;
  readonly firstSeason: number;
  readonly lastSeason: number;
  /** New players entering each season; overrides targetPlayerSeasons. */
  readonly playersPerSeasonIntake?: number;
  /** Approximate number of player-seasons wanted in firstSeason..lastSeason (default 12,000). */
  readonly targetPlayerSeasons?: number;
  /** Clubs per level (default: sized so a club carries about 30 to 40 players a season, at least 4). */
  readonly teamsPerLevel?: number;
  /** Share of entrants who are pitchers (default 0.4). */
  readonly pitcherShare?: number;
  readonly measuredFrom?: Partial<MeasuredFrom>;
  /** Lowest level with tracking measurements (every column of MeasuredFrom but groundball; default 'High'). */
  readonly trackedFromLevel?: string;
  /** Minor levels below the top level: 5 (Entry, Low, Mid, High, Elite; default), 4 (no Mid) or 3 (Low, High, Elite); see simLadder. */
  readonly minorLevels?: number;
  /** Showing above the next level's bar needed for a promotion between seasons (default 0.05; higher promotes fewer). */
  readonly promotionMargin?: number;
  /** Chance that a good enough showing earns the promotion (default 1). */
  readonly promotionChance?: number;
  /** Standard deviation of a season's showing around true value, which drives promotion and release (default 0.3). */
  readonly showingNoise?: number;
  /** Standard deviation of a season's form (talent units, per talent), added to the talents behind the batting and pitching lines only (default 0). */
  readonly statNoise?: number;
  /**
   * Change per season of the league's run environment, in talent units (default 0): at season s the stat lines
   * get era = eraDrift * (s - midpoint of firstSeason..lastSeason): hitters more power and less contact, pitchers more
   * stuff (battingLine, pitchingLine). The same at every level; true talents and careers are unaffected.
   */
  readonly eraDrift?: number;
  /** Stat lines below the top level are recorded only from this season (default firstSeason: all). */
  readonly minorsRecordedFrom?: number;
  /**
   * Share of the careers with a top-level season from firstSeason on that get a planted twin (default 0): a
   * second player, entered right after him, with the same career (true talents every season, birth date,
   * handedness, position, levels, clubs and playing time) whose stat lines, fielding lines and contracts are
   * drawn with luck of their own. The twins draw from their own random stream, so every other player's
   * career and lines are those of the league without twins (only the ids after a twin move up by one).
   * `players.twinOf` pairs them.
   */
  readonly twinShare?: number;
}

export interface ResolvedSimOptions {
  readonly seed: number;
  readonly firstSeason: number;
  readonly lastSeason: number;
  readonly playersPerSeasonIntake: number;
  readonly teamsPerLevel: number;
  readonly pitcherShare: number;
  readonly measuredFrom: MeasuredFrom;
  readonly trackedFromLevel: string;
  readonly minorLevels: number;
  readonly promotionMargin: number;
  readonly promotionChance: number;
  readonly showingNoise: number;
  readonly statNoise: number;
  readonly eraDrift: number;
  readonly minorsRecordedFrom: number;
  readonly twinShare: number;
}

/** The players of a league, as parallel arrays indexed by player (id "p000001" is index 0). */
export interface SimPlayers {
  readonly count: number;
  readonly ids: readonly string[];
  readonly names: readonly string[];
  readonly birthDates: readonly string[];
  readonly bats: readonly Bats[];
  readonly throws: readonly Throws[];
  /** 0 hitter, 1 pitcher. */
  readonly kind: Uint8Array;
  readonly entrySeason: Int16Array;
  /** Age on June 30 of the entry season. */
  readonly entryAge: Int8Array;
  /** Highest level index reached (over the whole career, including seasons before firstSeason). */
  readonly highestLevel: Int8Array;
  /** Seasons with a top-level stint (whole career). */
  readonly topLevelSeasons: Int16Array;
  /** Overall value (playerValue, talent units) of the player's peak talents: his true ceiling. */
  readonly peakValue: Float32Array;
  /** 1 when the career was still going after lastSeason (censored). */
  readonly active: Uint8Array;
  /** Index of the player's planted twin (SimOptions.twinShare), -1 for none; a pair points at each other. */
  readonly twinOf: Int32Array;
}

export interface SimLeague {
  readonly options: ResolvedSimOptions;
  /** Level names, low to high. */
  readonly levels: readonly string[];
  /** Club names; club i plays at level floor(i / teamsPerLevel). */
  readonly teams: readonly string[];
  readonly players: SimPlayers;
  readonly batting: ColumnTable;
  readonly fielding: ColumnTable;
  readonly pitching: ColumnTable;
  readonly contracts: ColumnTable;
  readonly truth: SimTruth;
}
