import { UsageError } from '../errors/KindredError.ts';
import { SeededRandom } from '../random/SeededRandom.ts';
import { shuffleInPlace } from '../random/shuffleInPlace.ts';

/**
 * A seeded sample of whole players holding at most about `maxRows` rows (every row of a chosen player
 * is taken, so a player's seasons stay together, as in splitByPlayer). Players are shuffled (sorted ids
 * first, so row order does not matter) and taken while the sample stays within `maxRows`; a player who
 * would overflow it is skipped. All rows when there are no more than `maxRows`. Row indices ascending.
 *
 * @example
 * sampleByPlayer(['a', 'a', 'b', 'c'], 10, 1); // => [0, 1, 2, 3] (everything fits)
 * sampleByPlayer(['a', 'a', 'b', 'c'], 2, 1).length; // => 2 (player a alone, or b and c)
 */
export function sampleByPlayer(groups: readonly string[], maxRows: number, seed: number): Int32Array {
  if (!(Number.isInteger(maxRows) && maxRows >= 1)) throw new UsageError(`sampleByPlayer: maxRows ${maxRows} (expected a positive integer)`);
  if (groups.length <= maxRows) return Int32Array.from(groups.keys());
  const rowsOf = new Map<string, number[]>();
  groups.forEach((g, i) => {
    const rows = rowsOf.get(g);
    if (rows) rows.push(i);
    else rowsOf.set(g, [i]);
  });
  const ids = [...rowsOf.keys()].sort();
  const order = shuffleInPlace(Int32Array.from(ids.keys()), new SeededRandom(seed));
  const taken = new Uint8Array(groups.length);
  let count = 0;
  for (const p of order) {
    const rows = rowsOf.get(ids[p] ?? '') ?? [];
    if (count + rows.length > maxRows) continue;
    for (const r of rows) taken[r] = 1;
    count += rows.length;
    if (count === maxRows) break;
  }
  const out: number[] = [];
  for (let i = 0; i < groups.length; i++) if (taken[i]) out.push(i);
  return Int32Array.from(out);
}
