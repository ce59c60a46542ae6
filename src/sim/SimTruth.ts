/**
 * The simulator's ground truth: for every player-season, the player's true
 * talents that season (after ageing; before any level shift or sampling
 * noise), his kind, primary position (DH for a hitter with no fielding, SP or
 * RP for pitchers), the levels he played at and his age on June 30.
 * Rows are grouped by player (in player order) and by season within a
 * player, so a player's rows are contiguous.
 *
 * @example
 * const t = league.truth.find('p000001', 2010);
 * t?.talents[0]; // => contact (hitter) or stuff (pitcher) that season
 */
import type { Position } from '../ingest/Roster.ts';
import { SIM_POSITIONS } from './simPositions.ts';
import { MAX_TALENTS, TALENT_NAMES, type SimKind } from './talentNames.ts';

export interface SeasonTruth {
  readonly playerId: string;
  readonly season: number;
  readonly kind: SimKind;
  readonly position: Position;
  readonly levels: readonly string[];
  readonly age: number;
  /** True talents named by TALENT_NAMES[kind] (7 for hitters, 6 for pitchers). */
  readonly talents: Float64Array;
}

const FIXED = 5; // player, season, kind, position, level mask

export class SimTruth {
  readonly talentNames: Readonly<Record<SimKind, readonly string[]>> = TALENT_NAMES;
  private data: Float32Array;
  private rows = 0;
  private readonly width = FIXED + 1 + MAX_TALENTS;
  private readonly levelNames: readonly string[];
  private ids: readonly string[] = [];
  private firstRow: Int32Array = new Int32Array(0);
  private rowCount: Int32Array = new Int32Array(0);

  constructor(levelNames: readonly string[], capacityRows = 1024) {
    this.levelNames = levelNames;
    this.data = new Float32Array(Math.max(1, capacityRows) * this.width);
  }

  get length(): number {
    return this.rows;
  }

  /** Appends one player-season (internal: used while simulating). */
  push(player: number, season: number, kind: SimKind, position: number, levelMask: number, age: number, talents: Float64Array): void {
    if ((this.rows + 1) * this.width > this.data.length) {
      const grown = new Float32Array(Math.ceil(this.data.length * 1.5) + this.width);
      grown.set(this.data);
      this.data = grown;
    }
    const b = this.rows * this.width;
    this.data[b] = player;
    this.data[b + 1] = season;
    this.data[b + 2] = kind === 'hitter' ? 0 : 1;
    this.data[b + 3] = position;
    this.data[b + 4] = levelMask;
    this.data[b + 5] = age;
    for (let k = 0; k < MAX_TALENTS; k++) this.data[b + FIXED + 1 + k] = talents[k] ?? Number.NaN;
    this.rows++;
  }

  /** Fixes player ids and builds the per-player index (internal: called once at the end). */
  seal(ids: readonly string[]): void {
    if (this.data.length > 1.1 * this.rows * this.width + this.width) this.data = this.data.slice(0, this.rows * this.width);
    this.ids = ids;
    this.firstRow = new Int32Array(ids.length).fill(-1);
    this.rowCount = new Int32Array(ids.length);
    for (let r = 0; r < this.rows; r++) {
      const p = this.playerIndex(r);
      if (this.firstRow[p] === -1) this.firstRow[p] = r;
      this.rowCount[p] = (this.rowCount[p] ?? 0) + 1;
    }
  }

  playerIndex(row: number): number {
    return this.data[row * this.width] ?? -1;
  }

  season(row: number): number {
    return this.data[row * this.width + 1] ?? Number.NaN;
  }

  kind(row: number): SimKind {
    return this.data[row * this.width + 2] === 1 ? 'pitcher' : 'hitter';
  }

  position(row: number): Position {
    return SIM_POSITIONS[this.data[row * this.width + 3] ?? 0] ?? 'DH';
  }

  /** Bit i set when the player played at level i that season. */
  levelMask(row: number): number {
    return this.data[row * this.width + 4] ?? 0;
  }

  levels(row: number): string[] {
    const mask = this.levelMask(row);
    return this.levelNames.filter((_, i) => (mask & (1 << i)) !== 0);
  }

  /** Highest level index played that season. */
  topLevel(row: number): number {
    return Math.floor(Math.log2(Math.max(1, this.levelMask(row))));
  }

  age(row: number): number {
    return this.data[row * this.width + 5] ?? Number.NaN;
  }

  /** Copies the row's talents into `out` (length >= the kind's talent count) and returns it. */
  talentsInto(row: number, out: Float64Array): Float64Array {
    const n = this.talentNames[this.kind(row)].length;
    const b = row * this.width + FIXED + 1;
    for (let k = 0; k < n && k < out.length; k++) out[k] = this.data[b + k] ?? Number.NaN;
    return out;
  }

  at(row: number): SeasonTruth {
    const kind = this.kind(row);
    const player = this.playerIndex(row);
    return {
      playerId: this.ids[player] ?? '',
      season: this.season(row),
      kind,
      position: this.position(row),
      levels: this.levels(row),
      age: this.age(row),
      talents: this.talentsInto(row, new Float64Array(this.talentNames[kind].length)),
    };
  }

  /** Rows of one player (by index into the player list): [first, first + count). */
  rowsOf(player: number): { readonly first: number; readonly count: number } {
    return { first: this.firstRow[player] ?? -1, count: this.rowCount[player] ?? 0 };
  }

  /** The truth of one player-season, or undefined when the player did not play that season. */
  find(playerId: string, season: number): SeasonTruth | undefined {
    const player = playerIndexOf(playerId);
    const { first, count } = this.rowsOf(player);
    for (let r = first; r >= 0 && r < first + count; r++) if (this.season(r) === season) return this.at(r);
    return undefined;
  }
}

/** Index of a player from his id ("p000123" is index 122), or -1. */
export function playerIndexOf(playerId: string): number {
  const m = /^p(\d+)$/.exec(playerId);
  return m === null ? -1 : Number(m[1]) - 1;
}
