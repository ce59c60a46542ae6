/** A plain decimal number such as -3, +1.5 or -0.25: read by a spreadsheet as a number, never as a formula. */
const PLAIN_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)$/;

/**
 * A text cell made safe to open in a spreadsheet: a cell that begins with
 * `=`, `+`, `-`, `@`, a tab or a carriage return is prefixed with an
 * apostrophe, so that it is shown as text instead of run as a formula
 * (OWASP, "CSV Injection": prefix such cells with a single quote). Plain
 * decimal numbers such as `-3` are left as they are (project choice: a
 * number cannot hold a formula, and negative values stay readable).
 *
 * @example
 * safeCsvCell('=HYPERLINK("x")'); // => "'=HYPERLINK(\"x\")"
 * safeCsvCell('-3');              // => '-3'
 * safeCsvCell('Ann Example');     // => 'Ann Example'
 */
export function safeCsvCell(text: string): string {
  const first = text.charCodeAt(0);
  // = + - @ tab CR
  if (first !== 0x3d && first !== 0x2b && first !== 0x2d && first !== 0x40 && first !== 0x09 && first !== 0x0d) return text;
  return PLAIN_NUMBER.test(text) ? text : `'${text}`;
}
