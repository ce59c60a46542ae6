import { safeCsvCell } from '../text/safeCsvCell.ts';
import type { CsvValue } from '../text/stringifyCsv.ts';

/**
 * One cell as RFC 4180 CSV: quoted when it holds a comma, quote or line break; quotes doubled. Text that
 * a spreadsheet would run as a formula is made safe first (see safeCsvCell).
 */
export function csvCell(value: CsvValue): string {
  const s = value === null || value === undefined ? '' : typeof value === 'string' ? safeCsvCell(value) : String(value);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Records as CSV text the way the CLI writes it (RFC 4180 quoting, one record a line ending in \\n). */
export function toCsv(records: readonly (readonly CsvValue[])[]): string {
  return records.map((r) => r.map(csvCell).join(',')).join('\n') + '\n';
}

/** Offers text to the user as a file download (made in the page; nothing is sent anywhere). */
export function download(fileName: string, type: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.hidden = true;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
