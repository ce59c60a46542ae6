import type { DimensionInfo } from '../profiles/Dimension.ts';
import { formatDecimal, formatRate } from '../text/numberFormats.ts';

/**
 * A dimension's natural-unit value as analysts write it (src/text/numberFormats.ts): a rate of three
 * digits without the leading zero (.345), others with the dimension's digits and thousands separators;
 * missing as a dash.
 *
 * @example
 * formatValue(0.3456, { digits: 3 }); // => '.346'
 * formatValue(2430, { digits: 0 }); // => '2,430'
 */
export function formatValue(value: number | null, dim: Pick<DimensionInfo, 'digits'>): string {
  if (value === null || Number.isNaN(value)) return '-';
  return dim.digits === 3 ? formatRate(value) : formatDecimal(value, dim.digits);
}
