/**
 * An amount in US dollars for a terminal: a dollar sign and thousands separators, no cents.
 *
 * @example
 * formatUsd(1250000); // => '$1,250,000'
 */
export function formatUsd(usd: number | null): string {
  if (usd === null || !Number.isFinite(usd)) return '-';
  return `$${Math.round(usd).toLocaleString('en-US')}`;
}
