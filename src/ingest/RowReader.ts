import type { ErrorCode } from '../errors/KindredError.ts';
import type { InputIssue } from '../errors/InputError.ts';
import type { Column } from './HeaderColumns.ts';
import { findControlCharacter, showControlCharacters } from '../text/controlCharacters.ts';
import { parseThirds, THIRDS_EXPECTED } from './parseThirds.ts';

const WHOLE = /^\s*\d+(?:\.0*)?\s*$/;
const DECIMAL = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;
const YEAR = /^\s*\d{4}\s*$/;
const DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/**
 * Converts the cells of one data row, collecting an issue for every bad
 * cell. Getters for required columns return NaN (numbers) or '' (text) when
 * the cell is bad; the row then has issues and is never used. Getters for
 * optional columns return `undefined` for an empty cell (missing, never zero).
 * One reader is reused for every row of a file.
 */
export class RowReader {
  issues: InputIssue[] = [];
  cells: readonly string[] = [];
  line = 0;

  constructor(readonly file: string) {}

  start(line: number, cells: readonly string[]): void {
    this.line = line;
    this.cells = cells;
    this.issues = [];
  }

  /** Adds an issue located at a column (or at the whole row when `col` is undefined). */
  report(code: ErrorCode, col: Column | undefined, value: string, expected: string): void {
    this.issues.push({
      code,
      file: this.file,
      line: this.line,
      column: col === undefined || col.index < 0 ? 0 : col.index + 1,
      field: col?.name ?? '',
      value,
      expected,
    });
  }

  /** The cell's text trimmed, or undefined when empty (a required column's empty cell is reported). */
  private raw(col: Column): string | undefined {
    if (col.index < 0) return undefined;
    const cell = this.cells[col.index] ?? '';
    const text = cell.length > 0 && (cell.charCodeAt(0) <= 32 || cell.charCodeAt(cell.length - 1) <= 32) ? cell.trim() : cell;
    if (text === '') {
      if (col.required) this.report('kindred.input.badValue', col, cell, `a value (${col.name} is a required column)`);
      return undefined;
    }
    return text;
  }

  /** Text without control or bidi characters (a cell holding one is reported; '' is returned). */
  text(col: Column): string {
    return this.textOpt(col) ?? '';
  }

  textOpt(col: Column): string | undefined {
    const text = this.raw(col);
    if (text === undefined || findControlCharacter(text) < 0) return text;
    this.report('kindred.input.controlCharacter', col, showControlCharacters(text), controlExpected(text));
    return undefined;
  }

  count(col: Column): number {
    return this.countOpt(col) ?? Number.NaN;
  }

  /** A non-negative whole number ("007" is 7, "12.0" is 12). */
  countOpt(col: Column): number | undefined {
    const text = this.raw(col);
    if (text === undefined) return undefined;
    if (WHOLE.test(text)) return Number(text);
    if (DECIMAL.test(text)) {
      const value = Number(text);
      if (value < 0) {
        this.report('kindred.input.negative', col, text, 'a count of 0 or more');
        return undefined;
      }
      if (Number.isInteger(value)) return value;
      this.report('kindred.input.notInteger', col, text, 'a whole number (a count)');
      return undefined;
    }
    this.report('kindred.input.notNumeric', col, text, 'a whole number (a count)');
    return undefined;
  }

  /** A finite decimal number, optionally bounded. */
  numberOpt(col: Column, min = -Infinity, max = Infinity, what = 'a number'): number | undefined {
    const text = this.raw(col);
    if (text === undefined) return undefined;
    const value = DECIMAL.test(text) ? Number(text) : Number.NaN;
    if (!Number.isFinite(value)) {
      this.report('kindred.input.notNumeric', col, text, what);
      return undefined;
    }
    if (value < min || value > max) {
      const bounds = min === -Infinity ? `at most ${max}` : max === Infinity ? `${min} or more` : `${min} to ${max}`;
      this.report(min === 0 && value < 0 ? 'kindred.input.negative' : 'kindred.input.outOfRange', col, text, `${what}, ${bounds}`);
      return undefined;
    }
    return value;
  }

  /** A percent, 0 to 100. */
  percent(col: Column): number | undefined {
    return this.numberOpt(col, 0, 100, 'a percent');
  }

  /** Innings in thirds notation, returned in outs. */
  thirds(col: Column): number {
    const text = this.raw(col);
    if (text === undefined) return Number.NaN;
    const outs = parseThirds(text);
    if (outs === null) {
      this.report('kindred.input.badThirds', col, text, THIRDS_EXPECTED);
      return Number.NaN;
    }
    return outs;
  }

  season(col: Column): number {
    const text = this.raw(col);
    if (text === undefined) return Number.NaN;
    if (YEAR.test(text)) return Number(text);
    this.report('kindred.input.badValue', col, text, 'a season as a 4-digit year');
    return Number.NaN;
  }

  /** A value out of a closed list. */
  oneOf<T extends string>(col: Column, allowed: ReadonlySet<T>, expected: string): T | undefined {
    const text = this.raw(col);
    if (text === undefined) return undefined;
    for (const a of allowed) if (a === text) return a;
    this.report('kindred.input.badValue', col, text, expected);
    return undefined;
  }

  /** A calendar date YYYY-MM-DD. */
  dateOpt(col: Column): string | undefined {
    const text = this.raw(col);
    if (text === undefined) return undefined;
    const m = DATE.exec(text);
    if (m !== null) {
      const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
      // setUTCFullYear, not Date.UTC: Date.UTC reads the years 0 to 99 as 1900 to 1999.
      const date = new Date(0);
      date.setUTCFullYear(y, mo - 1, d);
      if (date.getUTCFullYear() === y && date.getUTCMonth() === mo - 1 && date.getUTCDate() === d) return text;
    }
    this.report('kindred.input.badDate', col, text, 'a calendar date YYYY-MM-DD');
    return undefined;
  }

  /**
   * Reports `lhs > rhs` when both are known (NaN and undefined are not
   * compared), located at `col` with that cell's text as the value.
   */
  atMost(col: Column, lhsName: string, lhs: number | undefined, rhsName: string, rhs: number | undefined): void {
    if (lhs === undefined || rhs === undefined || !(lhs > rhs)) return;
    const value = col.index < 0 ? '' : (this.cells[col.index] ?? '').trim();
    this.report('kindred.input.inconsistent', col, value, `${lhsName} <= ${rhsName} (here ${lhs} > ${rhs})`);
  }
}

/** What a text cell holding a control or bidi character was expected to be, naming the character. */
export function controlExpected(text: string): string {
  const i = findControlCharacter(text);
  const code = (text.codePointAt(i) ?? 0).toString(16).toUpperCase().padStart(4, '0');
  return `text without control or bidirectional characters (character ${i + 1} is U+${code})`;
}
