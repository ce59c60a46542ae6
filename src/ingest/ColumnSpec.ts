/**
 * What one row of a roster file's column table says about a column: its CSV
 * name, the record field it fills, how its cells are read and checked, how
 * the stints of a season combine it, and whether it is required. The
 * readers, the stint combiner, the required-column lists, the range checks
 * and the record types all follow from these tables (see `*Columns.ts`).
 */

/**
 * How a cell is read:
 * - `player`: a player_id (in the season files, one listed in players.csv)
 * - `season`: a 4-digit year; `level`: a known level
 * - `team`: the optional team that tells stints apart; the record holds the list of teams
 * - `choice`: one of `values`
 * - `count`: a whole number, 0 or more; `thirds`: innings in thirds notation, held in outs
 * - `measure`: a decimal within `range`; `percent`: 0 to 100 (watched for fractions); `money`: 0 or more
 * - `text`: any text; `date`: a calendar date YYYY-MM-DD
 */
export type ColumnKind =
  | 'player' | 'season' | 'level' | 'team' | 'choice'
  | 'count' | 'thirds' | 'measure' | 'percent' | 'money'
  | 'text' | 'date';

/** Plausible bounds of a measurement in the units of the input file. */
export interface PlausibleRange {
  readonly min: number;
  readonly max: number;
  readonly unit: string;
}

/** A stint weight: a record field, or a field minus others (e.g. BF - SO - BB - HBP for balls in play). */
export type StintWeight = string | { readonly field: string; readonly minus: readonly string[] };

/**
 * How the stints of one season combine a column: `sum` (an optional count is
 * unknown as soon as one stint lacks it), or a mean weighted by `weight`,
 * by `fallback` when a stint with the value lacks that weight (see WeightedMean).
 */
export type CombineRule = 'sum' | { readonly mean: StintWeight; readonly fallback?: StintWeight };

export interface ColumnSpec {
  /** The column's name in the canonical CSV format. */
  readonly csv: string;
  /** The record field it fills. */
  readonly field: string;
  readonly kind: ColumnKind;
  readonly required: boolean;
  /** For value columns of a season file: how stints combine it. */
  readonly combine?: CombineRule;
  /** For `measure`: the plausible range (a value outside is refused with `kindred.input.outOfRange`). */
  readonly range?: PlausibleRange;
  /** For `choice`: the allowed values. */
  readonly values?: readonly string[];
  /** Values of a `choice` column that are read and checked, then the row is left out (fielding at P). */
  readonly skipped?: readonly string[];
  /** What a bad cell is expected to be, in words (choice and money columns). */
  readonly expected?: string;
  /**
   * Earlier canonical names of the column, still read (as a header name or a
   * column map key) with a one-line notice giving the current name.
   */
  readonly formerly?: readonly string[];
}

export type ColumnTable = readonly ColumnSpec[];

/** `a <= b` checked on every row when both sides are known, reported at column `at` (CSV names). */
export interface AtMostCheck {
  readonly at: string;
  /** Summed left side, e.g. ['2B', '3B', 'HR']. */
  readonly sum: readonly string[];
  readonly atMost: string;
}

/** The type a column's value has in a record. */
export type ValueOf<S extends ColumnSpec> =
  S['kind'] extends 'team' ? readonly string[]
    : S['kind'] extends 'choice' ? (S extends { readonly values: readonly (infer V)[] } ? V : string)
      : S['kind'] extends 'player' | 'level' | 'text' | 'date' ? string
        : number;

type Simplify<T> = { [K in keyof T]: T[K] } & {};

/** Always present: required columns and the list of teams (empty without a team column). */
type Present<S extends ColumnSpec> = S['required'] extends true ? true : S['kind'] extends 'team' ? true : false;

/**
 * The record type a table describes: one readonly field per column, required
 * columns (and `teams`) always present, optional columns absent when the cell is empty.
 */
export type RecordOf<T extends ColumnTable> = Simplify<
  { readonly [S in T[number] as Present<S> extends true ? S['field'] : never]: ValueOf<S> } &
  { readonly [S in T[number] as Present<S> extends true ? never : S['field']]?: ValueOf<S> }
>;

/** CSV names of a table's columns. */
export type CsvNameOf<T extends ColumnTable> = T[number]['csv'];
