import { describe, expect, it } from 'vitest';
import { wrapText } from '../../src/report/wrapText.ts';

describe('wrapText(text, indent, width)', () => {
  it('breaks at spaces so that no line passes the width, later lines indented', () => {
    expect(wrapText('a bb ccc', '  ', 5)).toEqual(['a bb', '  ccc']);
    const words = Array.from({ length: 60 }, (_, i) => `w${i}`).join(' ');
    const lines = wrapText(words);
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(100);
    expect(lines.join(' ').replace(/ +/g, ' ')).toBe(words);
  });
  it('keeps a short text on one line and a word longer than a line whole', () => {
    expect(wrapText('one line')).toEqual(['one line']);
    expect(wrapText('x '.concat('y'.repeat(12)), '  ', 10)).toEqual(['x', '  yyyyyyyyyyyy']);
  });
});
