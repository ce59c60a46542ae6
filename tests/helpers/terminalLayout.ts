/** Checks shared by the terminal-table tests: the width rule and values found under their headings. */
import { expect } from 'vitest';

/** The terminal width every table and footnote keeps to (README: "within 100 columns"). */
export const TERMINAL_COLUMNS = 100;

/** The text's lines, each checked to be at most 100 columns and free of trailing spaces. */
export function terminalLines(text: string): string[] {
  const lines = text.replace(/\n$/, '').split('\n');
  for (const line of lines) {
    expect([...line].length, `wider than ${TERMINAL_COLUMNS} columns: ${line}`).toBeLessThanOrEqual(TERMINAL_COLUMNS);
    expect(line, 'trailing space').not.toMatch(/\s$/);
  }
  return lines;
}

export type Align = 'left' | 'right';

/** A table's documented heading row: each heading with the side its values keep to. */
export interface Heading {
  readonly title: string;
  readonly align: Align;
}

/** Index of the heading line (the first that holds every title in order), with each title's start. */
export function findHeadings(lines: readonly string[], headings: readonly Heading[]): { line: number; at: number[] } {
  for (const [i, line] of lines.entries()) {
    const at: number[] = [];
    let from = 0;
    for (const h of headings) {
      const j = line.indexOf(h.title, from);
      if (j < 0) break;
      at.push(j);
      from = j + h.title.length;
    }
    if (at.length === headings.length) return { line: i, at };
  }
  throw new Error(`no line holds the headings ${headings.map((h) => h.title).join(' | ')}:\n${lines.join('\n')}`);
}

/**
 * Checks that each value sits under its heading: a left-aligned value starts where its heading starts, a
 * right-aligned one ends where its heading ends, each with a space (or the line's edge) on its open side.
 */
export function expectUnderHeadings(row: string, headings: readonly Heading[], at: readonly number[], values: readonly string[]): void {
  headings.forEach((h, k) => {
    const value = values[k] ?? '';
    const start = h.align === 'left' ? (at[k] ?? 0) : (at[k] ?? 0) + h.title.length - value.length;
    expect(row.slice(start, start + value.length), `${h.title} in: ${row}`).toBe(value);
    const before = row.charAt(start - 1);
    const after = row.charAt(start + value.length);
    expect(before === '' || before === ' ', `${h.title}: a space before "${value}" in: ${row}`).toBe(true);
    expect(after === '' || after === ' ', `${h.title}: a space after "${value}" in: ${row}`).toBe(true);
  });
}
