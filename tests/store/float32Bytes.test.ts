import { describe, expect, it } from 'vitest';
import { bytesToFloat32, float32ToBytes } from '../../src/store/float32Bytes.ts';

describe('float32ToBytes / bytesToFloat32', () => {
  it('writes IEEE 754 binary32 little-endian: 1.0 is 0x3F800000, -2.0 is 0xC0000000 (IEEE 754-2008 layout)', () => {
    expect(Array.from(float32ToBytes(new Float32Array([1, -2])))).toEqual([0, 0, 0x80, 0x3f, 0, 0, 0, 0xc0]);
  });
  it('reads back from an unaligned offset by copying', () => {
    const bytes = float32ToBytes(new Float32Array([1.5, -3]));
    const shifted = new Uint8Array(bytes.length + 1);
    shifted.set(bytes, 1);
    expect(Array.from(bytesToFloat32(shifted.subarray(1)))).toEqual([1.5, -3]);
  });
  it('copies only the viewed part of a subarray', () => {
    const values = new Float32Array([1, 2, 3, 4]);
    expect(Array.from(bytesToFloat32(float32ToBytes(values.subarray(1, 3))))).toEqual([2, 3]);
  });
  it('refuses a length that is not a multiple of 4', () => {
    expect(() => bytesToFloat32(new Uint8Array(6))).toThrow(/6 bytes are not a whole number of float32 values/);
  });
});
