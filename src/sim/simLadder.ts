/**
 * The ladder of levels a simulated league uses: the default six-level table
 * (levelTable.ts: Entry, Low, Mid, High, Elite, Top) or a shorter one with 3 or 4
 * minor levels, made of rows of the same table so that each level keeps its
 * bar, opposition shift, typical age and season length:
 * - 5 minor levels: Entry, Low, Mid, High, Elite (the default);
 * - 4 minor levels: Entry, Low, High, Elite (no Mid: the step from Low to High is bigger);
 * - 3 minor levels: Low, High, Elite (no entry level: everyone enters at Low or above).
 * The top level is always the last (Top). Project choice (invented).
 *
 * @example
 * simLadder(4).names; // => ['Entry', 'Low', 'High', 'Elite', 'Top']
 * simLadder(4).base;  // => [0, 1, 3, 4, 5] (rows of the default table)
 */
import { UsageError } from '../errors/KindredError.ts';
import {
  FULL_PA, FULL_RELIEF_GAMES, FULL_STARTS, LEVEL_BAR, LEVEL_SHIFT, SEASON_GAMES, SIM_LEVELS, TYPICAL_AGE,
} from './levelTable.ts';

export interface SimLadder {
  /** Level names, low to high; the last is the top level. */
  readonly names: readonly string[];
  /** For each level, its row in the default table (levelTable.ts). */
  readonly base: readonly number[];
  /** Index of the top level (names.length - 1). */
  readonly top: number;
  readonly bar: readonly number[];
  readonly shift: readonly number[];
  readonly typicalAge: readonly number[];
  readonly seasonGames: readonly number[];
  readonly fullPa: readonly number[];
  readonly fullStarts: readonly number[];
  readonly fullReliefGames: readonly number[];
}

const ROWS: Readonly<Record<number, readonly number[]>> = {
  5: [0, 1, 2, 3, 4, 5],
  4: [0, 1, 3, 4, 5],
  3: [1, 3, 4, 5],
};

export const DEFAULT_MINOR_LEVELS = 5;

export function simLadder(minorLevels: number = DEFAULT_MINOR_LEVELS): SimLadder {
  const base = ROWS[minorLevels];
  if (base === undefined) throw new UsageError(`minorLevels ${minorLevels}: expected 3, 4 or 5`, { minorLevels });
  const pick = (table: readonly number[]): number[] => base.map((b) => table[b] ?? NaN);
  return {
    names: base.map((b) => SIM_LEVELS[b] ?? ''),
    base,
    top: base.length - 1,
    bar: pick(LEVEL_BAR),
    shift: pick(LEVEL_SHIFT),
    typicalAge: pick(TYPICAL_AGE),
    seasonGames: pick(SEASON_GAMES),
    fullPa: pick(FULL_PA),
    fullStarts: pick(FULL_STARTS),
    fullReliefGames: pick(FULL_RELIEF_GAMES),
  };
}
