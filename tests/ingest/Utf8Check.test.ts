import { describe, expect, it } from 'vitest';
import { firstInvalidUtf8, utf16Kind } from '../../src/ingest/Utf8Check.ts';

// Source: RFC 3629, section 4 (the UTF-8 byte sequences) and its examples; the Unicode Standard on UTF-16.
describe('firstInvalidUtf8(buf)', () => {
  it('accepts ASCII and 2-, 3- and 4-byte sequences (é C3 A9, 日 E6 97 A5, U+10348 F0 90 8D 88)', () => {
    const ok = Buffer.from([0x41, 0xc3, 0xa9, 0xe6, 0x97, 0xa5, 0xf0, 0x90, 0x8d, 0x88]);
    expect(firstInvalidUtf8(ok)).toBe(ok.length);
  });
  it.each([
    ['a lone continuation byte', [0x41, 0x80], 1],
    ['Latin-1 é (E9) before ASCII', [0x41, 0xe9, 0x41], 1],
    ['an overlong "/" (C0 AF)', [0xc0, 0xaf], 0],
    ['a surrogate (ED A0 80)', [0x41, 0xed, 0xa0, 0x80], 1],
    ['above U+10FFFF (F4 90 80 80)', [0xf4, 0x90, 0x80, 0x80], 0],
    ['a truncated sequence', [0x41, 0xe6, 0x97], 1],
  ])('finds %s', (_what, bytes, at) => {
    expect(firstInvalidUtf8(Buffer.from(bytes))).toBe(at);
  });
});

describe('utf16Kind(buf)', () => {
  it('tells UTF-16 by its byte order mark or by zeros at every other byte, and leaves UTF-8 alone', () => {
    expect(utf16Kind(Buffer.from([0xff, 0xfe, 0x41, 0x00]))).toBe('little-endian');
    expect(utf16Kind(Buffer.from([0xfe, 0xff, 0x00, 0x41]))).toBe('big-endian');
    expect(utf16Kind(Buffer.from('player_id,name', 'utf16le'))).toBe('little-endian');
    expect(utf16Kind(Buffer.from('player_id,name', 'utf16le').swap16())).toBe('big-endian');
    expect(utf16Kind(Buffer.from('player_id,name,Zoë'))).toBeUndefined();
  });
});
