/**
 * A number rounded to `digits` decimals as JSON shows it: Number(x.toFixed(digits)), so 0.1 + 0.2
 * prints 0.3 and halves round as toFixed does on the binary value (1.005 -> 1 at two digits).
 *
 * @example
 * round(0.1 + 0.2, 3); // => 0.3
 * round(2 / 3, 1); // => 0.7
 */
export function round(x: number, digits: number): number {
  return Number(x.toFixed(digits));
}

/**
 * As `round`, with null for a value that is not finite (NaN, Infinity): JSON has no place for them.
 *
 * @example
 * roundOrNull(NaN, 3); // => null
 * roundOrNull(0.12345, 3); // => 0.123
 */
export function roundOrNull(x: number, digits: number): number | null {
  return Number.isFinite(x) ? round(x, digits) : null;
}
