import { UsageError } from '../errors/KindredError.ts';
import { SeededRandom } from '../random/SeededRandom.ts';
import { shuffleInPlace } from '../random/shuffleInPlace.ts';

export interface PlayerSplit {
  /** Row indices for training, ascending. */
  readonly train: Int32Array;
  /** Row indices for validation, ascending. */
  readonly val: Int32Array;
}

/**
 * A seeded train/validation split BY PLAYER: every row of a player lands on the same side, so the
 * validation loss measures how the model does on players it never saw (common practice: grouped
 * hold-out). Players are shuffled (sorted ids first, so row order does not matter) and moved to the
 * validation side until it holds at least `valFraction` of the rows. With two or more players and
 * 0 < valFraction < 1 both sides get at least one player. valFraction 0 puts everything in training.
 *
 * @example
 * splitByPlayer(['a', 'a', 'b', 'c'], 0.25, 1); // e.g. { train: [0, 1, 3], val: [2] }
 */
export function splitByPlayer(groups: readonly string[], valFraction: number, seed: number): PlayerSplit {
  if (!(valFraction >= 0 && valFraction < 1)) {
    throw new UsageError(`splitByPlayer: valFraction ${valFraction} (expected 0 <= valFraction < 1)`);
  }
  const rowsOf = new Map<string, number[]>();
  groups.forEach((g, i) => {
    const rows = rowsOf.get(g);
    if (rows) rows.push(i);
    else rowsOf.set(g, [i]);
  });
  const ids = [...rowsOf.keys()].sort();
  const order = shuffleInPlace(Int32Array.from(ids.keys()), new SeededRandom(seed));
  const wanted = valFraction * groups.length;
  const isVal = new Uint8Array(groups.length);
  let valRows = 0;
  let valPlayers = 0;
  if (valFraction > 0 && ids.length >= 2) {
    for (const p of order) {
      if (valRows >= wanted || valPlayers === ids.length - 1) break;
      for (const r of rowsOf.get(ids[p] ?? '') ?? []) isVal[r] = 1;
      valRows += rowsOf.get(ids[p] ?? '')?.length ?? 0;
      valPlayers++;
    }
  }
  const train: number[] = [];
  const val: number[] = [];
  for (let i = 0; i < groups.length; i++) (isVal[i] ? val : train).push(i);
  return { train: Int32Array.from(train), val: Int32Array.from(val) };
}
