import { UsageError } from '../errors/KindredError.ts';

/**
 * The input of every embedding in this folder: `n` profiles of `d` standardised dimensions
 * (z-scores within a stratum, so 0 is the stratum mean), row-major, `NaN` where a dimension is
 * missing (not tracked that season). `groups[i]` is the player id of row `i`; rows of one player
 * always land on the same side of a train/validation split.
 */
export interface EmbedData {
  /** n * d values, row-major; NaN = missing. */
  readonly x: Float64Array;
  readonly n: number;
  readonly d: number;
  /** Player id per row (length n). */
  readonly groups: readonly string[];
  /**
   * The row each profile is trained to give back (n * d, NaN = missing): absent for a plain autoencoder
   * (the target is the row itself), another season of the same player for the cross-season objective
   * (crossSeasonPairs). The loss counts the entries present in both the input and the target.
   */
  readonly y?: Float64Array;
}

/**
 * Checks the shape of an `EmbedData` (a programmer mistake throws a UsageError):
 * n and d positive integers, x of length n * d with no infinite value, one group per row.
 *
 * @example
 * checkEmbedData({ x: new Float64Array([0, NaN]), n: 1, d: 2, groups: ['p1'] }); // passes
 */
export function checkEmbedData(data: EmbedData): void {
  const { x, n, d, groups } = data;
  if (!Number.isInteger(n) || n < 1) throw new UsageError(`embed data: n ${n} (expected a positive integer)`, { n });
  if (!Number.isInteger(d) || d < 1) throw new UsageError(`embed data: d ${d} (expected a positive integer)`, { d });
  if (x.length !== n * d) {
    throw new UsageError(`embed data: x has ${x.length} values (expected n * d = ${n * d})`, { n, d });
  }
  if (data.y && data.y.length !== n * d) {
    throw new UsageError(`embed data: y has ${data.y.length} values (expected n * d = ${n * d})`, { n, d });
  }
  if (groups.length !== n) {
    throw new UsageError(`embed data: ${groups.length} groups (expected one per row, ${n})`, { n });
  }
  for (const [name, values] of [['x', x], ['y', data.y ?? new Float64Array(0)]] as const) {
    for (let i = 0; i < values.length; i++) {
      const v = values[i] ?? NaN;
      if (v === Infinity || v === -Infinity) {
        const row = Math.floor(i / d);
        throw new UsageError(`embed data: ${name} row ${row} dimension ${i - row * d} is ${v} (expected a finite number or NaN)`, {
          row,
        });
      }
    }
  }
}
