/**
 * A count of outs written as innings in thirds notation (common practice:
 * the digit after the point counts outs, so it is only ever 0, 1 or 2).
 *
 * @example
 * formatThirds(20); // => "6.2"
 * formatThirds(18); // => "6.0"
 */
export function formatThirds(outs: number): string {
  const whole = Math.floor(outs / 3);
  return `${whole}.${outs - whole * 3}`;
}
