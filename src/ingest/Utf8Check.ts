import { isUtf8 } from 'node:buffer';
import { Transform, type TransformCallback } from 'node:stream';

/** Why a file is not UTF-8 text, and where (1-based line, 0-based byte offset). */
export class EncodingProblem extends Error {
  constructor(readonly line: number, readonly offset: number, readonly value: string, readonly expected: string) {
    super(expected);
  }
}

/**
 * Passes a file's bytes through unchanged while checking that they are
 * UTF-8 (RFC 3629): fails with an EncodingProblem at the first invalid
 * sequence, or at the start for UTF-16 (a byte order mark FF FE or FE FF, or
 * zero bytes at every other position, as ASCII text in UTF-16 has).
 * Sequences split across chunks are carried over.
 */
export class Utf8Check extends Transform {
  private carry: Buffer | undefined;
  private offset = 0;
  private lines = 1;
  private first = true;

  override _transform(chunk: Buffer, _encoding: BufferEncoding, callback: TransformCallback): void {
    const buf = this.carry === undefined ? chunk : Buffer.concat([this.carry, chunk]);
    if (this.first) {
      this.first = false;
      const utf16 = utf16Kind(buf);
      if (utf16 !== undefined) {
        callback(new EncodingProblem(1, 0, utf16, `UTF-8 text (this file is UTF-16, ${utf16}: save or export it as UTF-8)`));
        return;
      }
    }
    const cut = completeLength(buf);
    const body = buf.subarray(0, cut);
    this.carry = cut < buf.length ? Buffer.from(buf.subarray(cut)) : undefined;
    if (!isUtf8(body)) {
      callback(this.problemAt(body, firstInvalidUtf8(body)));
      return;
    }
    this.count(body, body.length);
    this.offset += body.length;
    callback(null, body);
  }

  override _flush(callback: TransformCallback): void {
    if (this.carry !== undefined) callback(this.problemAt(this.carry, 0));
    else callback();
  }

  private count(buf: Buffer, end: number): void {
    for (let i = buf.indexOf(10); i >= 0 && i < end; i = buf.indexOf(10, i + 1)) this.lines += 1;
  }

  private problemAt(buf: Buffer, at: number): EncodingProblem {
    this.count(buf, at);
    const bytes = [...buf.subarray(at, at + 4)].map((b) => b.toString(16).toUpperCase().padStart(2, '0')).join(' ');
    return new EncodingProblem(this.lines, this.offset + at, `bytes ${bytes}`,
      `UTF-8 text (byte ${this.offset + at + 1} of the file is not valid UTF-8; a file in Latin-1 or Windows-1252 must be saved as UTF-8)`);
  }
}

/** 'little-endian' or 'big-endian' for UTF-16 text (byte order mark, or zeros at every other byte), else undefined. */
export function utf16Kind(buf: Buffer): string | undefined {
  if (buf.length >= 2 && buf[0] === 0xff && buf[1] === 0xfe) return 'little-endian';
  if (buf.length >= 2 && buf[0] === 0xfe && buf[1] === 0xff) return 'big-endian';
  const n = Math.min(buf.length, 1024) & ~1;
  if (n < 4) return undefined;
  let evenZeros = 0;
  let oddZeros = 0;
  for (let i = 0; i < n; i += 2) {
    if (buf[i] === 0) evenZeros += 1;
    if (buf[i + 1] === 0) oddZeros += 1;
  }
  const half = n / 2;
  if (oddZeros >= half * 0.5 && evenZeros < half * 0.1) return 'little-endian';
  if (evenZeros >= half * 0.5 && oddZeros < half * 0.1) return 'big-endian';
  return undefined;
}

/** The length of the buffer without a multi-byte sequence cut off at its end. */
function completeLength(buf: Buffer): number {
  let i = buf.length - 1;
  const stop = Math.max(0, buf.length - 4);
  while (i >= stop && ((buf[i] ?? 0) & 0xc0) === 0x80) i -= 1;
  if (i < stop) return buf.length;
  const lead = buf[i] ?? 0;
  const need = lead >= 0xf0 ? 4 : lead >= 0xe0 ? 3 : lead >= 0xc0 ? 2 : 1;
  return buf.length - i < need ? i : buf.length;
}

/**
 * The offset of the first byte that starts an invalid UTF-8 sequence (RFC
 * 3629, section 4: no overlong forms, no surrogates, nothing above U+10FFFF),
 * or the buffer's length when it is all valid.
 */
export function firstInvalidUtf8(buf: Buffer): number {
  let i = 0;
  while (i < buf.length) {
    const b = buf[i] ?? 0;
    if (b < 0x80) {
      i += 1;
      continue;
    }
    let need: number;
    let min: number;
    let max = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) { need = 1; min = 0x80; }
    else if (b === 0xe0) { need = 2; min = 0xa0; }
    else if (b >= 0xe1 && b <= 0xef) { need = 2; min = 0x80; if (b === 0xed) max = 0x9f; }
    else if (b === 0xf0) { need = 3; min = 0x90; }
    else if (b >= 0xf1 && b <= 0xf3) { need = 3; min = 0x80; }
    else if (b === 0xf4) { need = 3; min = 0x80; max = 0x8f; }
    else return i;
    const second = buf[i + 1];
    if (second === undefined || second < min || second > max) return i;
    for (let k = 2; k <= need; k++) {
      const c = buf[i + k];
      if (c === undefined || (c & 0xc0) !== 0x80) return i;
    }
    i += need + 1;
  }
  return buf.length;
}
