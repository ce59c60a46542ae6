import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { stringifyCsv } from '../../src/text/stringifyCsv.ts';

describe('stringifyCsv(records)', () => {
  it('quotes as RFC 4180 and makes formula-like text cells safe (OWASP CSV injection guidance)', () => {
    const text = stringifyCsv([['name', 'note', 'HR'], ['=HYPERLINK("x","y")', 'a,"b"', 12], ['@SUM(A1)', null, -3]]);
    const back: string[][] = parse(text);
    expect(back).toEqual([['name', 'note', 'HR'], ['\'=HYPERLINK("x","y")', 'a,"b"', '12'], ["'@SUM(A1)", '', '-3']]);
  });
  it('writes flags as true and false, the way the page writes them', () => {
    expect(stringifyCsv([['frontier', 'censored'], [true, false]])).toBe('frontier,censored\ntrue,false\n');
  });
});
