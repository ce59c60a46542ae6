import type { Column } from './HeaderColumns.ts';
import type { RowReader } from './RowReader.ts';
import type { Player } from './Roster.ts';

/** Seasons a roster may hold, first and last year inclusive. */
export interface SeasonSpan {
  readonly from: number;
  readonly to: number;
}

/**
 * The default plausible seasons: from 1860 (project choice: before the first
 * professional leagues, common practice dates them to the 1870s) to next year.
 */
export function defaultSeasonSpan(now: Date = new Date()): SeasonSpan {
  return { from: 1860, to: now.getUTCFullYear() + 1 };
}

/**
 * What the season files are checked against: the players of players.csv
 * (and the lines of those rejected there) and the known levels.
 */
export class RosterLookups {
  /** Each known level to itself: every record of a level shares one string (a roster holds millions of records). */
  private readonly levelSet: ReadonlyMap<string, string>;
  private readonly levelsExpected: string;

  constructor(
    readonly players: ReadonlyMap<string, Player>,
    private readonly rejectedPlayers: ReadonlyMap<string, number>,
    private readonly playersFile: string,
    readonly levels: readonly string[],
    /** Undefined when the roster has no readable levels.csv: its problem is reported once, levels are not checked. */
    private readonly levelsFile: string | undefined,
    private readonly seasons: SeasonSpan = defaultSeasonSpan(),
    /** False when players.csv could not be read (its problem is reported once; ids are not checked against it). */
    private readonly playersReadable = true,
  ) {
    this.levelSet = new Map(levels.map((l) => [l, l]));
    this.levelsExpected = `a known level: one of ${levels.join(', ')} (the levels of ${levelsFile ?? 'levels.csv'})`;
  }

  /** Reads a player_id that must be in players.csv. */
  player(row: RowReader, col: Column): string {
    const id = row.text(col);
    // the id as players.csv gave it, so that every record of a player shares one string
    const known = this.players.get(id)?.playerId;
    if (known === id) return known;
    if (id === '' || this.players.has(id) || !this.playersReadable) return id;
    const rejectedAt = this.rejectedPlayers.get(id);
    const expected = rejectedAt === undefined
      ? `a player_id listed in ${this.playersFile}`
      : `a player_id of a valid row of ${this.playersFile} (this player's row, line ${rejectedAt}, was rejected)`;
    row.report('kindred.input.unknownPlayer', col, id, expected);
    return id;
  }

  /** Reads a season: a 4-digit year within the plausible span. */
  season(row: RowReader, col: Column): number {
    const season = row.season(col);
    if (Number.isNaN(season) || (season >= this.seasons.from && season <= this.seasons.to)) return season;
    row.report('kindred.input.outOfRange', col, String(season),
      `a season from ${this.seasons.from} to ${this.seasons.to} (the plausible span; another span can be given when building)`);
    return Number.NaN;
  }

  /** Reports a season that does not come after the player's birth date (players.csv). */
  bornBefore(row: RowReader, playerId: string, season: number, col: Column): void {
    const born = this.players.get(playerId)?.birthDate;
    if (born === undefined || Number.isNaN(season)) return;
    const year = Number(born.slice(0, 4));
    if (year < season) return;
    const value = col.index < 0 ? '' : (row.cells[col.index] ?? '').trim();
    row.report('kindred.input.inconsistent', col, value,
      `a season after the player's birth (${playerId} was born ${born}, per ${this.playersFile})`);
  }

  /** Reads a level that must be in the known order. */
  level(row: RowReader, col: Column): string {
    const level = row.text(col);
    const known = this.levelSet.get(level);
    if (known !== undefined) return known;
    if (level === '' || this.levelsFile === undefined) return level;
    row.report('kindred.input.badValue', col, level, this.levelsExpected);
    return level;
  }
}

/** Remembers the first line of each key and reports a later row with the same key. */
export class KeyLines {
  private readonly lines = new Map<string, number>();

  constructor(private readonly describe: string) {}

  /** Records the key; reports a duplicate (at column 0, naming both lines) when already seen. */
  check(row: RowReader, key: string, shown: string): void {
    const first = this.lines.get(key);
    if (first === undefined) {
      this.lines.set(key, row.line);
      return;
    }
    row.report('kindred.input.duplicateKey', undefined, shown,
      `one row per ${this.describe} (line ${first} has the same key; this is line ${row.line})`);
  }
}
