import { describe, expect, it } from 'vitest';
import {
  formatCount, formatDecimal, formatInnings, formatPercent, formatRate, formatSigned, formatUsd, formatWhole,
} from '../../src/text/numberFormats.ts';
import { formatValue } from '../../src/report/formatValue.ts';

// Reference: the Unicode CLDR en-US decimal pattern "#,##0" (groups of three digits separated by a
// comma) with the dollar sign before the amount; whole dollars, half a dollar rounded up
// (common practice for salaries, which are agreed in whole dollars).
describe('formatUsd(usd)', () => {
  it('writes the sign and groups of three digits: 1250000 => $1,250,000', () => {
    expect(formatUsd(1_250_000)).toBe('$1,250,000');
    expect(formatUsd(14_695_000)).toBe('$14,695,000');
  });
  it('puts a separator from 1,000 up and none below', () => {
    expect(formatUsd(999)).toBe('$999');
    expect(formatUsd(1000)).toBe('$1,000');
    expect(formatUsd(0)).toBe('$0');
  });
  it('shows whole dollars: cents rounded, half a dollar up', () => {
    expect(formatUsd(1_234_567.49)).toBe('$1,234,567');
    expect(formatUsd(499.5)).toBe('$500');
  });
  it('shows a dash for an unknown amount', () => {
    expect(formatUsd(null)).toBe('-');
    expect(formatUsd(Number.NaN)).toBe('-');
    expect(formatUsd(Number.POSITIVE_INFINITY)).toBe('-');
  });
});

describe('numbers by kind', () => {
  it('formatRate writes rates as the trade does, without the leading zero: .333, 1.000, -.050 (common practice)', () => {
    expect(formatRate(1 / 3)).toBe('.333');
    expect(formatRate(0.3456)).toBe('.346');
    expect(formatRate(1)).toBe('1.000');
    expect(formatRate(-0.05)).toBe('-.050');
    expect(formatRate(null)).toBe('-');
  });
  it('formatWhole shows OPS+ and FIP- whole (common practice: index figures have no decimals)', () => {
    expect(formatWhole(100.6)).toBe('101');
    expect(formatWhole(87.4)).toBe('87');
    expect(formatWhole(undefined)).toBe('-');
  });
  it('formatCount groups thousands (CLDR en-US): 2593 => 2,593', () => {
    expect(formatCount(2593)).toBe('2,593');
    expect(formatCount(119)).toBe('119');
  });
  it('formatDecimal and formatSigned keep their digits and group thousands', () => {
    expect(formatDecimal(150.125, 1)).toBe('150.1');
    expect(formatDecimal(1234.567, 1)).toBe('1,234.6');
    expect(formatSigned(0.0412, 2)).toBe('+0.04');
    expect(formatSigned(-0.12, 2)).toBe('-0.12');
  });
  it('formatPercent shows shares as whole percents', () => {
    expect(formatPercent(0.594)).toBe('59%');
    expect(formatPercent(1)).toBe('100%');
  });
  it('formatInnings writes outs in thirds notation: 451 outs => 150.1, 452 => 150.2, 450 => 150.0 (common practice)', () => {
    expect(formatInnings(451)).toBe('150.1');
    expect(formatInnings(452)).toBe('150.2');
    expect(formatInnings(450)).toBe('150.0');
    expect(formatInnings(3003)).toBe('1,001.0');
  });
  it('formatValue gives a dimension\u2019s value by its digits: rates as rates, others with separators', () => {
    expect(formatValue(0.3456, { digits: 3 })).toBe('.346');
    expect(formatValue(1.934, { digits: 2 })).toBe('1.93');
    expect(formatValue(2430, { digits: 0 })).toBe('2,430');
    expect(formatValue(null, { digits: 1 })).toBe('-');
  });
});
