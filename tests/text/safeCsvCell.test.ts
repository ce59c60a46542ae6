import { describe, expect, it } from 'vitest';
import { safeCsvCell } from '../../src/text/safeCsvCell.ts';

// Source: OWASP, "CSV Injection": cells beginning with = + - @, tab (0x09) or carriage return (0x0D)
// are prefixed with a single quote so a spreadsheet shows them as text.
describe('safeCsvCell(text)', () => {
  it.each([
    ['=HYPERLINK("http://example.invalid","x")'],
    ['+cmd|\' /C calc\'!A0'],
    ['-2+3+cmd|\' /C calc\'!A0'],
    ['@SUM(1+9)*cmd|\' /C calc\'!A0'],
    ['\t=1+1'],
    ['\r=1+1'],
  ])('prefixes %j with an apostrophe', (text) => {
    expect(safeCsvCell(text)).toBe(`'${text}`);
  });
  it('leaves other text, the empty cell and plain decimal numbers (-3, +1.5, -.25) as they are', () => {
    for (const text of ['Ann Example', '', 'p001', "'quoted", ' =leading space', '-3', '+1.5', '-.25', '-12.5']) {
      expect(safeCsvCell(text)).toBe(text);
    }
  });
  it('still prefixes a number followed by more text (-3+cmd)', () => {
    expect(safeCsvCell('-3+cmd')).toBe("'-3+cmd");
  });
});
