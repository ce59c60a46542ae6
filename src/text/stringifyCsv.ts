import { stringify } from 'csv-stringify/sync';
import { safeCsvCell } from './safeCsvCell.ts';

/** A CSV cell before quoting: text, a number, a flag or empty. */
export type CsvValue = string | number | boolean | null | undefined;

/**
 * Records as CSV text (RFC 4180 quoting by csv-stringify), every text cell
 * passed through {@link safeCsvCell} so the file is safe to open in a
 * spreadsheet; flags as true or false (csv-stringify alone would write 1 and an empty cell); numbers and
 * empty cells as they are.
 *
 * @example
 * stringifyCsv([['name', 'HR'], ['@SUM(A1)', 12]]); // => "name,HR\n'@SUM(A1),12\n"
 */
export function stringifyCsv(records: readonly (readonly CsvValue[])[]): string {
  return stringify(records.map((r) => r.map((v) => (typeof v === 'string' ? safeCsvCell(v) : typeof v === 'boolean' ? String(v) : v))));
}
