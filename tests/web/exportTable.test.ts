import { describe, expect, it } from 'vitest';
import { csvCell, toCsv } from '../../src/web/exportTable.ts';

describe('toCsv(header, rows) for the page download', () => {
  it('quotes as RFC 4180 and writes formula-like text as text (OWASP CSV injection guidance)', () => {
    expect(toCsv(['name', 'HR'], [['@SUM(A1)', 12], ['a,b', -3]])).toBe("name,HR\r\n'@SUM(A1),12\r\n\"a,b\",-3\r\n");
    expect(csvCell('=1+1')).toBe("'=1+1");
    expect(csvCell(null)).toBe('');
  });
});
