/**
 * A binary file of named columns, for the large tables of a store (players, a group's rows): read
 * with one checksum and no per-value parsing, the numbers handed out as typed-array views of the
 * file's bytes. Written by encodeColumns, read by decodeColumns.
 *
 * Layout (all integers little-endian):
 * - bytes 0-3: the tag `KCOL`; 4-7: uint32 layout version (COLUMNS_VERSION); 8-11: uint32 byte size
 *   of the header; then the header, UTF-8 JSON: `[{ name, type, length, offset, bytes }]`;
 * - then each column's data at its `offset` (a multiple of 8, so every typed view is aligned):
 *   `i32` int32, `f64` float64 (IEEE 754 binary64), `u8` one byte a value, `strings` a uint32 offset
 *   per string plus one (in UTF-16 code units of the joined text, so a string is a slice of it)
 *   followed by the joined text as UTF-8.
 *
 * @example
 * const bytes = encodeColumns([{ name: 'season', type: 'i32', values: [2024, 2025] }]);
 * decodeColumns(bytes, 'x.bin').i32('season', 2); // => Int32Array [2024, 2025]
 */
import { z } from 'zod';
import { corruptFile } from './parseStoreJson.ts';
import { HOST_IS_LITTLE_ENDIAN } from './littleEndian.ts';

export const COLUMNS_TAG = 'KCOL';
export const COLUMNS_VERSION = 1;
const PREAMBLE = 12;

export type ColumnInput =
  | { readonly name: string; readonly type: 'i32'; readonly values: ArrayLike<number> }
  | { readonly name: string; readonly type: 'f64'; readonly values: ArrayLike<number> }
  | { readonly name: string; readonly type: 'u8'; readonly values: ArrayLike<number> }
  | { readonly name: string; readonly type: 'strings'; readonly values: readonly string[] };

const headerSchema = z.array(
  z.strictObject({
    name: z.string(),
    type: z.enum(['i32', 'f64', 'u8', 'strings']),
    length: z.number().int().nonnegative(),
    offset: z.number().int().nonnegative(),
    bytes: z.number().int().nonnegative(),
  }),
);
type Header = z.infer<typeof headerSchema>;

const align8 = (n: number): number => Math.ceil(n / 8) * 8;

/** The bytes of a columns file holding `columns` (names must be distinct). */
export function encodeColumns(columns: readonly ColumnInput[]): Uint8Array {
  const encoder = new TextEncoder();
  const bodies: Uint8Array[] = columns.map((c) => {
    if (c.type === 'strings') {
      const offsets = new Uint32Array(c.values.length + 1);
      let at = 0;
      c.values.forEach((s, i) => {
        offsets[i] = at;
        at += s.length;
      });
      offsets[c.values.length] = at;
      const text = encoder.encode(c.values.join(''));
      const out = new Uint8Array(offsets.byteLength + text.byteLength);
      const view = new DataView(out.buffer);
      offsets.forEach((o, i) => view.setUint32(i * 4, o, true));
      out.set(text, offsets.byteLength);
      return out;
    }
    const width = c.type === 'f64' ? 8 : c.type === 'i32' ? 4 : 1;
    const out = new Uint8Array(c.values.length * width);
    const view = new DataView(out.buffer);
    for (let i = 0; i < c.values.length; i++) {
      const v = c.values[i] ?? 0;
      if (c.type === 'f64') view.setFloat64(i * 8, v, true);
      else if (c.type === 'i32') view.setInt32(i * 4, v, true);
      else view.setUint8(i, v);
    }
    return out;
  });
  // The header's size depends on the offsets it holds: grow the data start until it fits.
  let start = 0;
  let headerBytes = encoder.encode('[]');
  for (;;) {
    let at = align8(start);
    const header: Header = columns.map((c, i) => {
      const bytes = bodies[i]?.byteLength ?? 0;
      const entry = { name: c.name, type: c.type, length: c.values.length, offset: at, bytes };
      at = align8(at + bytes);
      return entry;
    });
    headerBytes = encoder.encode(JSON.stringify(header));
    if (PREAMBLE + headerBytes.byteLength <= start) break;
    start = align8(PREAMBLE + headerBytes.byteLength);
  }
  const header = headerSchema.parse(JSON.parse(new TextDecoder().decode(headerBytes)));
  const last = header[header.length - 1];
  const total = last ? last.offset + last.bytes : start;
  const out = new Uint8Array(total);
  out.set(encoder.encode(COLUMNS_TAG), 0);
  const view = new DataView(out.buffer);
  view.setUint32(4, COLUMNS_VERSION, true);
  view.setUint32(8, headerBytes.byteLength, true);
  out.set(headerBytes, PREAMBLE);
  header.forEach((h, i) => {
    const body = bodies[i];
    if (body) out.set(body, h.offset);
  });
  return out;
}

/** The columns of a decoded file; each accessor checks the column's type and, when given, its length. */
export interface Columns {
  readonly names: readonly string[];
  has(name: string): boolean;
  i32(name: string, length?: number): Int32Array;
  f64(name: string, length?: number): Float64Array;
  u8(name: string, length?: number): Uint8Array;
  strings(name: string, length?: number): string[];
}

/**
 * Reads a columns file (`where` names it in errors). The header and every column's bounds are
 * checked here, each column's type and length when it is asked for; anything amiss is StoreError
 * `kindred.store.corrupt`. Numeric columns share memory with `bytes` (aligned on a little-endian host).
 */
export function decodeColumns(bytes: Uint8Array, where: string): Columns {
  const bad = (what: string): Error => corruptFile(where, what);
  if (bytes.byteLength < PREAMBLE) throw bad(`${bytes.byteLength} bytes, shorter than the ${PREAMBLE}-byte preamble`);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const tag = new TextDecoder().decode(bytes.subarray(0, 4));
  if (tag !== COLUMNS_TAG) throw bad(`starts with ${JSON.stringify(tag)} (expected the tag ${COLUMNS_TAG})`);
  const version = view.getUint32(4, true);
  if (version !== COLUMNS_VERSION) throw bad(`columns layout version ${version} (expected ${COLUMNS_VERSION})`);
  const headerBytes = view.getUint32(8, true);
  if (PREAMBLE + headerBytes > bytes.byteLength) throw bad(`a header of ${headerBytes} bytes runs past the end of the file`);
  let raw: unknown;
  try {
    raw = JSON.parse(new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(PREAMBLE, PREAMBLE + headerBytes)));
  } catch {
    throw bad('has a header that is not valid JSON text');
  }
  const parsed = headerSchema.safeParse(raw);
  if (!parsed.success) throw bad(`has a header of unexpected shape (${parsed.error.issues[0]?.message ?? 'invalid'})`);
  const byName = new Map<string, Header[number]>();
  for (const h of parsed.data) {
    if (byName.has(h.name)) throw bad(`has column ${h.name} twice`);
    if (h.offset % 8 !== 0 || h.offset < PREAMBLE + headerBytes || h.offset + h.bytes > bytes.byteLength) {
      throw bad(`column ${h.name} at ${h.offset} (${h.bytes} bytes) lies outside the data part`);
    }
    const width = h.type === 'f64' ? 8 : h.type === 'i32' ? 4 : h.type === 'u8' ? 1 : 0;
    if (width > 0 ? h.bytes !== h.length * width : h.bytes < (h.length + 1) * 4) {
      throw bad(`column ${h.name} has ${h.bytes} bytes for ${h.length} ${h.type} values`);
    }
    byName.set(h.name, h);
  }
  let end = PREAMBLE + headerBytes;
  for (const h of byName.values()) end = Math.max(end, h.offset + h.bytes);
  if (end !== bytes.byteLength) throw bad(`has ${bytes.byteLength - end} bytes after its last column`);
  const column = (name: string, type: Header[number]['type'], length: number | undefined): Header[number] => {
    const h = byName.get(name);
    if (!h) throw bad(`has no column ${name}`);
    if (h.type !== type) throw bad(`column ${name} holds ${h.type} (expected ${type})`);
    if (length !== undefined && h.length !== length) throw bad(`column ${name} has ${h.length} values (expected ${length})`);
    return h;
  };
  const aligned = (h: Header[number], width: number): { buffer: ArrayBuffer; offset: number } | null => {
    const offset = bytes.byteOffset + h.offset;
    return HOST_IS_LITTLE_ENDIAN && offset % width === 0 && bytes.buffer instanceof ArrayBuffer ? { buffer: bytes.buffer, offset } : null;
  };
  return {
    names: [...byName.keys()],
    has: (name) => byName.has(name),
    i32(name, length) {
      const h = column(name, 'i32', length);
      const a = aligned(h, 4);
      if (a) return new Int32Array(a.buffer, a.offset, h.length);
      return Int32Array.from({ length: h.length }, (_, i) => view.getInt32(h.offset + i * 4, true));
    },
    f64(name, length) {
      const h = column(name, 'f64', length);
      const a = aligned(h, 8);
      if (a) return new Float64Array(a.buffer, a.offset, h.length);
      return Float64Array.from({ length: h.length }, (_, i) => view.getFloat64(h.offset + i * 8, true));
    },
    u8(name, length) {
      const h = column(name, 'u8', length);
      return bytes.subarray(h.offset, h.offset + h.length);
    },
    strings(name, length) {
      const h = column(name, 'strings', length);
      const textAt = h.offset + (h.length + 1) * 4;
      let text: string;
      try {
        text = new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(textAt, h.offset + h.bytes));
      } catch {
        throw bad(`column ${name} is not valid UTF-8 text`);
      }
      const out = new Array<string>(h.length);
      let from = view.getUint32(h.offset, true);
      if (from !== 0) throw bad(`column ${name} does not start at offset 0`);
      for (let i = 0; i < h.length; i++) {
        const to = view.getUint32(h.offset + (i + 1) * 4, true);
        if (to < from || to > text.length) throw bad(`column ${name} string ${i} ends at ${to} (expected ${from} to ${text.length})`);
        out[i] = text.slice(from, to);
        from = to;
      }
      if (from !== text.length) throw bad(`column ${name} leaves ${text.length - from} characters after its last string`);
      return out;
    },
  };
}
