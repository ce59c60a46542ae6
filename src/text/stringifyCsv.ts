import { stringify } from 'csv-stringify/sync';
import { safeCsvCell } from './safeCsvCell.ts';

/** A CSV cell before quoting: text, a number, a flag or empty. */
export type CsvValue = string | number | boolean | null | undefined;

/**
 * Records as CSV text (RFC 4180 quoting by csv-stringify), every text cell
 * passed through {@link safeCsvCell} so the file is safe to open in a
 * spreadsheet; numbers, flags and empty cells are written as they are.
 *
 * @example
 * stringifyCsv([['name', 'HR'], ['@SUM(A1)', 12]]); // => "name,HR\n'@SUM(A1),12\n"
 */
export function stringifyCsv(records: readonly (readonly CsvValue[])[]): string {
  return stringify(records.map((r) => r.map((v) => (typeof v === 'string' ? safeCsvCell(v) : v))));
}
