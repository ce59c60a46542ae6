/**
 * Characters refused in roster text: C0 controls (ESC, NUL, tab, line
 * breaks, ...), DEL and C1 controls (Unicode general category Cc), and the
 * bidirectional formatting characters (Unicode Standard Annex #9: U+061C,
 * U+200E, U+200F, U+202A to U+202E, U+2066 to U+2069), which can clear a
 * terminal, retitle its window or reorder the text shown around them.
 */
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/;
const CONTROL_ALL = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;

/**
 * The index of the first control or bidi character of a text, -1 when it has none.
 *
 * @example
 * findControlCharacter('Ann\u001b[2J'); // => 3
 * findControlCharacter('Ann Example'); // => -1
 */
export function findControlCharacter(text: string): number {
  return CONTROL.test(text) ? text.search(CONTROL) : -1;
}

/**
 * The text with each control or bidi character shown as its code point
 * (`U+001B`), safe to print in a message.
 *
 * @example
 * showControlCharacters('Ann\u001b[2J'); // => 'Ann<U+001B>[2J'
 */
export function showControlCharacters(text: string): string {
  return text.replace(CONTROL_ALL, (c) => `<U+${(c.codePointAt(0) ?? 0).toString(16).toUpperCase().padStart(4, '0')}>`);
}
