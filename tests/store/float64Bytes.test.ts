import { describe, expect, it } from 'vitest';
import { bytesToFloat64, float64ToBytes } from '../../src/store/float64Bytes.ts';

describe('float64ToBytes / bytesToFloat64', () => {
  it('writes IEEE 754 binary64 little-endian: 1.0 is 0x3FF0000000000000', () => {
    expect(Array.from(float64ToBytes(new Float64Array([1])))).toEqual([0, 0, 0, 0, 0, 0, 0xf0, 0x3f]);
  });
  it('round-trips through an unaligned offset and refuses a ragged length', () => {
    const bytes = float64ToBytes(new Float64Array([Math.E, -0.1]));
    const shifted = new Uint8Array(bytes.length + 3);
    shifted.set(bytes, 3);
    expect(Array.from(bytesToFloat64(shifted.subarray(3)))).toEqual([Math.E, -0.1]);
    expect(() => bytesToFloat64(new Uint8Array(12))).toThrow(expect.objectContaining({ code: 'kindred.store.corrupt' }));
  });
});
