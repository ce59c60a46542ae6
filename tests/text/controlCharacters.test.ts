import { describe, expect, it } from 'vitest';
import { findControlCharacter, showControlCharacters } from '../../src/text/controlCharacters.ts';

// Sources: Unicode general category Cc (U+0000-001F, U+007F-009F); Unicode Standard Annex #9 for the
// bidirectional formatting characters (ALM U+061C, LRM/RLM U+200E/F, LRE..RLO U+202A-202E, LRI..PDI U+2066-2069).
describe('findControlCharacter(text)', () => {
  it.each([
    ['\u001b[2J', 0], ['a\u0000', 1], ['a\tb', 1], ['a\u007f', 1], ['a\u0085', 1], ['x\u202e', 1], ['x\u2066', 1], ['x\u061c', 1], ['x\u200f', 1],
  ])('finds the control or bidi character in %j at %i', (text, at) => {
    expect(findControlCharacter(text)).toBe(at);
  });
  it('accepts letters with accents, CJK, emoji and the no-break space', () => {
    for (const text of ['Zoë Ñandú', '山田', 'Ann 🙂', 'a\u00a0b', '']) expect(findControlCharacter(text)).toBe(-1);
  });
});

describe('showControlCharacters(text)', () => {
  it('shows each control character as its code point (the worked example)', () => {
    expect(showControlCharacters('Ann\u001b[2J')).toBe('Ann<U+001B>[2J');
    expect(showControlCharacters('\u202e')).toBe('<U+202E>');
  });
});
