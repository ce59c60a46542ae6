import type { DimensionInfo } from '../profiles/Dimension.ts';

/**
 * A natural-unit value as analysts write it: rates below 1 without the leading zero (.345), others
 * with the dimension's digits; missing as a dash.
 *
 * @example
 * formatValue(0.3456, { digits: 3 }); // => '.346'
 * formatValue(1.934, { digits: 2 }); // => '1.93'
 */
export function formatValue(value: number | null, dim: Pick<DimensionInfo, 'digits'>): string {
  if (value === null || Number.isNaN(value)) return '-';
  const text = value.toFixed(dim.digits);
  if (dim.digits === 3 && Math.abs(value) < 1) return text.replace(/^(-?)0\./, '$1.');
  return text;
}
