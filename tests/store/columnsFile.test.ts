/**
 * The columns file: values round-trip exactly, bytes are laid out little-endian as IEEE 754 and two's
 * complement say (checked against known bit patterns), strings with characters outside the basic
 * plane slice correctly, and damaged headers or columns are refused with kindred.store.corrupt.
 */
import { describe, expect, it } from 'vitest';
import { decodeColumns, encodeColumns } from '../../src/store/columnsFile.ts';

const sample = (): Uint8Array =>
  encodeColumns([
    { name: 'season', type: 'i32', values: [2024, -1, 2147483647] },
    { name: 'age', type: 'f64', values: [1, NaN, -0.5] },
    { name: 'code', type: 'u8', values: [0, 7, 255] },
    { name: 'name', type: 'strings', values: ['Ana Ödegaard', '', 'Zoë 𝔅ell', 'B. Vale'] },
  ]);

/** Where a column's data starts, from the header (tested through decode's own checks below). */
function offsetOf(bytes: Uint8Array, name: string): number {
  const headerLength = new DataView(bytes.buffer, bytes.byteOffset).getUint32(8, true);
  const header: unknown = JSON.parse(new TextDecoder().decode(bytes.subarray(12, 12 + headerLength)));
  if (!Array.isArray(header)) throw new Error('header is not a list');
  for (const h of header) if (typeof h === 'object' && h !== null && 'name' in h && h.name === name && 'offset' in h && typeof h.offset === 'number') return h.offset;
  throw new Error(`no column ${name}`);
}

describe('encodeColumns / decodeColumns', () => {
  it('round-trips every column type exactly', () => {
    const cols = decodeColumns(sample(), 'x.bin');
    expect(cols.names).toEqual(['season', 'age', 'code', 'name']);
    expect(Array.from(cols.i32('season', 3))).toEqual([2024, -1, 2147483647]);
    expect(Array.from(cols.f64('age'))).toEqual([1, NaN, -0.5]);
    expect(Array.from(cols.u8('code'))).toEqual([0, 7, 255]);
    expect(cols.strings('name', 4)).toEqual(['Ana Ödegaard', '', 'Zoë 𝔅ell', 'B. Vale']);
  });

  it('lays numbers out little-endian: 1.0 as 00 00 00 00 00 00 F0 3F (IEEE 754 binary64), -1 as FF FF FF FF (two\'s complement)', () => {
    const bytes = sample();
    const age = offsetOf(bytes, 'age');
    expect(Array.from(bytes.subarray(age, age + 8))).toEqual([0, 0, 0, 0, 0, 0, 0xf0, 0x3f]);
    const season = offsetOf(bytes, 'season');
    expect(Array.from(bytes.subarray(season, season + 8))).toEqual([0xe8, 0x07, 0, 0, 0xff, 0xff, 0xff, 0xff]); // 2024 = 0x07E8
    expect(age % 8).toBe(0);
    expect(season % 8).toBe(0);
  });

  it('refuses a wrong tag, a damaged header, a missing column, a wrong type or length', () => {
    const corrupt = { code: 'kindred.store.corrupt' };
    const tag = sample();
    tag[0] = 0x58;
    expect(() => decodeColumns(tag, 'x.bin')).toThrow(expect.objectContaining({ ...corrupt, message: expect.stringContaining('tag') }));
    const header = sample();
    header[12] = 0x7b; // the header's opening '[' made '{'
    expect(() => decodeColumns(header, 'x.bin')).toThrow(expect.objectContaining(corrupt));
    expect(() => decodeColumns(sample().subarray(0, 40), 'x.bin')).toThrow(expect.objectContaining(corrupt));
    const appended = new Uint8Array(sample().length + 28);
    appended.set(sample());
    expect(() => decodeColumns(appended, 'x.bin')).toThrow(expect.objectContaining({ ...corrupt, message: expect.stringContaining('28 bytes after its last column') }));
    const cols = decodeColumns(sample(), 'x.bin');
    expect(() => cols.i32('nothing')).toThrow(expect.objectContaining({ ...corrupt, message: expect.stringContaining('no column nothing') }));
    expect(() => cols.f64('season')).toThrow(expect.objectContaining({ ...corrupt, message: expect.stringContaining('holds i32') }));
    expect(() => cols.u8('code', 4)).toThrow(expect.objectContaining({ ...corrupt, message: expect.stringContaining('has 3 values (expected 4)') }));
  });

  it('refuses string offsets that run backwards or past the text', () => {
    const bytes = sample();
    const at = offsetOf(bytes, 'name');
    new DataView(bytes.buffer, bytes.byteOffset).setUint32(at + 8, 1000, true);
    expect(() => decodeColumns(bytes, 'x.bin').strings('name')).toThrow(expect.objectContaining({ code: 'kindred.store.corrupt' }));
  });
});
