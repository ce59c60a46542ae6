import { TERMINAL_COLUMNS } from './terminalColumns.ts';

/**
 * A sentence broken into lines of at most `width` columns at spaces, later lines indented; a word
 * longer than a line stays whole on its own line.
 *
 * @example
 * wrapText('a bb ccc', '  ', 5); // => ['a bb', '  ccc']
 */
export function wrapText(text: string, indent = '  ', width = TERMINAL_COLUMNS): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ').filter((w) => w !== '')) {
    const lead = lines.length === 0 ? '' : indent;
    const next = line === '' ? lead + word : `${line} ${word}`;
    if (line !== '' && [...next].length > width) {
      lines.push(line);
      line = indent + word;
    } else {
      line = next;
    }
  }
  if (line !== '' || lines.length === 0) lines.push(line);
  return lines;
}
