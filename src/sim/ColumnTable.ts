/**
 * A growable row-major table of numbers (Float32, NaN = missing), so that a
 * league of a million player-seasons stays a few flat arrays rather than
 * millions of objects. Text columns (player, level, team, position) hold an
 * index into the league's lookup lists; see cellText for the written form.
 *
 * @example
 * const t = new ColumnTable([{ name: 'G', format: 'int' }]);
 * t.push([12]); t.get(0, 0); // => 12
 */
export type ColumnFormat =
  /** Index into the league's player list, written as the player id. */
  | 'player'
  /** Index into the level list. */
  | 'level'
  /** Index into the club list. */
  | 'team'
  /** Index into FIELD_POSITIONS. */
  | 'pos'
  | 'int'
  | 'fixed1'
  | 'fixed2'
  /** A count of outs, written in thirds notation (20 -> "6.2"). */
  | 'thirds'
  /** Thousands of US dollars, written in dollars. */
  | 'thousandsUsd';

export interface ColumnSpec {
  readonly name: string;
  readonly format: ColumnFormat;
}

export class ColumnTable {
  readonly columns: readonly ColumnSpec[];
  readonly width: number;
  private data: Float32Array;
  private rows = 0;

  constructor(columns: readonly ColumnSpec[], capacityRows = 1024) {
    this.columns = columns;
    this.width = columns.length;
    this.data = new Float32Array(Math.max(1, capacityRows) * this.width);
  }

  get length(): number {
    return this.rows;
  }

  /** Index of a column by name, or -1. */
  columnIndex(name: string): number {
    return this.columns.findIndex((c) => c.name === name);
  }

  /** Appends a row given in column order (NaN for missing) and returns its index. */
  push(values: ArrayLike<number>): number {
    if ((this.rows + 1) * this.width > this.data.length) {
      const grown = new Float32Array(Math.ceil(this.data.length * 1.5) + this.width);
      grown.set(this.data);
      this.data = grown;
    }
    const base = this.rows * this.width;
    for (let c = 0; c < this.width; c++) this.data[base + c] = values[c] ?? Number.NaN;
    return this.rows++;
  }

  /** The stored value (NaN when missing or out of range). */
  get(row: number, col: number): number {
    if (row < 0 || row >= this.rows || col < 0 || col >= this.width) return Number.NaN;
    return this.data[row * this.width + col] ?? Number.NaN;
  }

  /** Drops spare capacity (when more than a tenth is unused) once the table is complete. */
  trim(): void {
    if (this.data.length > 1.1 * this.rows * this.width + this.width) this.data = this.data.slice(0, this.rows * this.width);
  }

  /** Bytes held by the table. */
  get byteLength(): number {
    return this.data.byteLength;
  }
}
