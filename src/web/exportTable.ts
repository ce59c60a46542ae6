import { safeCsvCell } from '../text/safeCsvCell.ts';

/**
 * One cell as RFC 4180 CSV: quoted when it holds a comma, quote or line break; quotes doubled. Text that
 * a spreadsheet would run as a formula is made safe first (see safeCsvCell).
 */
export function csvCell(value: string | number | boolean | null): string {
  const s = value === null ? '' : typeof value === 'string' ? safeCsvCell(value) : String(value);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** A table as RFC 4180 CSV text (CRLF line ends), header first. */
export function toCsv(header: readonly string[], rows: readonly (readonly (string | number | boolean | null)[])[]): string {
  return [header, ...rows].map((r) => r.map(csvCell).join(',')).join('\r\n') + '\r\n';
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
