import { fitRidge } from '../stats/fitRidge.ts';

/**
 * A group's imputation of a dimension a profile lacks from the dimensions every profile has
 * (regression imputation, the conditional mean of Buck 1960, "A method of estimation of missing values
 * in multivariate data suitable for use with an electronic computer", JRSS B 22(2); from memory): the
 * core dimensions are those missing in fewer than CORE_MAX_MISSING of the group's rows (a hitter's
 * rates from his batting and fielding lines), and each other dimension (the measurements tracked only
 * in some seasons and levels: exit velocity, run speed, arm strength, ...) gets a least-squares line on
 * the core ones, fitted on the rows that have it, with its residual variance (mean squared residual).
 * A missing core value counts as 0, its stratum's mean. Rows without any value (no profile) are not counted.
 */
export interface CoreImputer {
  /** The core dimensions (column indices), the features of every line. */
  readonly core: Int32Array;
  /** Per dimension: intercept then one slope per core dimension; null for core dimensions and dimensions too rarely present to fit. */
  readonly lines: readonly (Float64Array | null)[];
  /** Per dimension: the mean squared residual of its line (1 where none). */
  readonly residual: Float64Array;
}

/** A dimension is core when missing in fewer than this share of the group's rows (project choice). */
export const CORE_MAX_MISSING = 0.05;
/** A line is fitted only on at least this many rows that have the dimension (project choice). */
export const MIN_FIT_ROWS = 200;
/** At most this many rows per line, taken at an even stride (project choice: the fit settles long before). */
export const MAX_FIT_ROWS = 4000;
/**
 * At most this many of the group's rows are looked at, at an even stride (project choice): which
 * dimensions are core and the lines' rows are taken from them. The fit runs at a group's first query,
 * and scanning every row of a 285,000-row group cost about 0.18 s of a cold command at 1,000,000
 * player-seasons; groups up to this size are scanned whole, as before.
 */
export const SCAN_ROWS = 40_000;
/** Ridge penalty of the lines (standardised features; barely more than least squares, keeps collinear rates solvable). */
const RIDGE = 1;

/**
 * Fits the lines of a group's standardised profiles `z` (row-major n x d, NaN missing); `ridge` and
 * `minRows` default to RIDGE and MIN_FIT_ROWS.
 *
 * @example
 * // Anscombe's (1973) first data set as column 1 against column 0 (always present), ridge 0:
 * // lines[1] = [3.00, 0.500], residual[1] = 13.76 / 11 = 1.25
 */
export function fitCoreImputer(
  z: Float32Array | Float64Array, n: number, d: number, o: { readonly ridge?: number; readonly minRows?: number } = {},
): CoreImputer {
  const ridge = o.ridge ?? RIDGE;
  const minRows = o.minRows ?? MIN_FIT_ROWS;
  const scan = Math.max(1, Math.ceil(n / SCAN_ROWS));
  const present = new Float64Array(d);
  let scanned = 0;
  for (let r = 0; r < n; r += scan) {
    let any = false;
    for (let j = 0; j < d; j++) {
      if (Number.isNaN(z[r * d + j] as number)) continue;
      present[j] = (present[j] as number) + 1;
      any = true;
    }
    // a row without any profile (a later season in a group seen as of an earlier one, groupAsOf) says nothing of which dimensions are core
    if (any) scanned++;
  }
  const core = Int32Array.from({ length: d }, (_, j) => j).filter((j) => scanned > 0 && 1 - (present[j] as number) / scanned < CORE_MAX_MISSING);
  const lines: (Float64Array | null)[] = [];
  const residual = new Float64Array(d).fill(1);
  const features = (r: number): number[] => Array.from(core, (k) => {
    const v = z[r * d + k] as number;
    return Number.isNaN(v) ? 0 : v;
  });
  for (let j = 0; j < d; j++) {
    if (core.includes(j) || core.length === 0 || (present[j] as number) < minRows) {
      lines.push(null);
      continue;
    }
    const stride = Math.max(1, Math.floor((present[j] as number) / MAX_FIT_ROWS));
    const x: number[][] = [];
    const y: number[] = [];
    let seen = 0;
    for (let r = 0; r < n; r += scan) {
      const v = z[r * d + j] as number;
      if (Number.isNaN(v) || seen++ % stride !== 0) continue;
      x.push(features(r));
      y.push(v);
    }
    const line = Float64Array.from(fitRidge(x, y, ridge).coefficients);
    let squares = 0;
    x.forEach((row, i) => (squares += ((y[i] as number) - lineValue(line, row, 0, null)) ** 2));
    residual[j] = squares / y.length;
    lines.push(line);
  }
  return { core, lines, residual };
}

/**
 * The line's value for the profile at `offset` of `z` (its core values; a missing one counts as 0).
 * `core` maps the line's slopes to columns of `z`; pass `null` when `z` holds the core values alone, in order.
 */
export function lineValue(line: Float64Array, z: ArrayLike<number>, offset: number, core: Int32Array | null): number {
  let s = line[0] as number;
  for (let k = 1; k < line.length; k++) {
    const v = z[offset + (core ? (core[k - 1] as number) : k - 1)] as number;
    if (!Number.isNaN(v)) s += (line[k] as number) * v;
  }
  return s;
}
