/**
 * Innings in the trade's thirds notation, converted to outs.
 *
 * Common practice: the digit after the point counts outs, not tenths, so it
 * can only be 0, 1 or 2. "6.2" is 6 innings and 2 outs = 6 * 3 + 2 = 20 outs;
 * "6" and "6.0" are 18 outs. "6.3", "6.25", "6." and "-1" are not innings.
 *
 * @example
 * parseThirds('6.2'); // => 20
 * parseThirds('6.3'); // => null
 * @returns the number of outs, or `null` when the text is not a whole number
 *   of innings optionally followed by .0, .1 or .2 (surrounding spaces allowed).
 */
export function parseThirds(text: string): number | null {
  const match = THIRDS.exec(text);
  if (match === null) return null;
  const whole = Number(match[1]);
  const outs = match[2] === undefined ? 0 : Number(match[2]);
  return whole * OUTS_PER_INNING + outs;
}

const OUTS_PER_INNING = 3;
const THIRDS = /^\s*(\d+)(?:\.([012]))?\s*$/;

/** Words for the issue raised when {@link parseThirds} refuses a cell. */
export const THIRDS_EXPECTED = 'a whole number of innings, optionally .1 or .2 (thirds notation: 6.2 is 6 innings and 2 outs)';
