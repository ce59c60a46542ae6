/**
 * Numbers as Kindred shows them, by kind, in one place for the terminal tables, the CSV files and the
 * page (common practice in baseball writing unless said otherwise):
 * - rates below 1 without the leading zero, three digits: .333 (AVG, OBP, K%...);
 * - index figures (OPS+, FIP-, likeness) whole: 101;
 * - counts with thousands separators: 2,593;
 * - money in whole US dollars with separators: $1,250,000;
 * - innings in thirds notation: 150.1 is 150 and one third;
 * - shares as whole percents: 59%.
 * An unknown value shows as a dash. CSV cells hold the plain numbers of the JSON answer instead (no
 * separators, a leading zero), so spreadsheets read them as numbers.
 */

const DASH = '-';
const known = (x: number | null | undefined): x is number => x !== null && x !== undefined && Number.isFinite(x);

/**
 * A rate with `digits` decimals, without the leading zero when it is below 1 in size.
 *
 * @example
 * formatRate(0.3456); // => '.346'
 * formatRate(1); // => '1.000'
 */
export function formatRate(x: number | null | undefined, digits = 3): string {
  if (!known(x)) return DASH;
  const text = x.toFixed(digits);
  return Math.abs(x) < 1 ? text.replace(/^(-?)0\./, '$1.') : text;
}

/**
 * A whole number (OPS+, FIP-, likeness), separators from 1,000.
 *
 * @example
 * formatWhole(100.6); // => '101'
 */
export function formatWhole(x: number | null | undefined): string {
  return known(x) ? Math.round(x).toLocaleString('en-US') : DASH;
}

/**
 * A count with thousands separators.
 *
 * @example
 * formatCount(2593); // => '2,593'
 */
export function formatCount(x: number | null | undefined): string {
  return formatWhole(x);
}

/**
 * A decimal with a fixed number of digits and thousands separators.
 *
 * @example
 * formatDecimal(1234.567, 1); // => '1,234.6'
 */
export function formatDecimal(x: number | null | undefined, digits: number): string {
  if (!known(x)) return DASH;
  return x.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

/**
 * A signed decimal (a skill score or a change): +0.04, -0.12.
 *
 * @example
 * formatSigned(0.0412, 2); // => '+0.04'
 */
export function formatSigned(x: number | null | undefined, digits: number): string {
  if (!known(x)) return DASH;
  const text = formatDecimal(x, digits);
  return x >= 0 ? `+${text}` : text;
}

/**
 * A share (0 to 1) as a whole percent.
 *
 * @example
 * formatPercent(0.594); // => '59%'
 */
export function formatPercent(x: number | null | undefined): string {
  return known(x) ? `${Math.round(x * 100)}%` : DASH;
}

/**
 * An amount in US dollars: a dollar sign and thousands separators, no cents (Unicode CLDR en-US).
 *
 * @example
 * formatUsd(1250000); // => '$1,250,000'
 */
export function formatUsd(usd: number | null | undefined): string {
  return known(usd) ? `$${Math.round(usd).toLocaleString('en-US')}` : DASH;
}

/**
 * Innings from outs in the trade's thirds notation (common practice: .1 and .2 are one and two outs).
 *
 * @example
 * formatInnings(451); // => '150.1'
 */
export function formatInnings(outs: number | null | undefined): string {
  if (!known(outs)) return DASH;
  const whole = Math.round(outs);
  return `${Math.floor(whole / 3).toLocaleString('en-US')}.${whole % 3}`;
}
