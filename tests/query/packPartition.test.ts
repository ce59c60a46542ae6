import { describe, expect, it } from 'vitest';
import { packedPartitionOf, packPartition } from '../../src/query/packPartition.ts';

describe('packPartition(z, d, partition)', () => {
  it('lays out the worked example: rows 0 and 2 of a 3 x 3 matrix on dims 0 and 2 give [1, 3, 7, 9]', () => {
    const z = Float32Array.of(1, 2, 3, 4, 5, 6, 7, 8, 9);
    const packed = packPartition(z, 3, { rows: Int32Array.of(0, 2), dims: [0, 2] });
    expect([...packed.values]).toEqual([1, 3, 7, 9]);
    expect([...packed.rows]).toEqual([0, 2]);
  });

  it('keeps missing values missing', () => {
    const packed = packPartition(Float32Array.of(NaN, 1, 2, NaN), 2, { rows: Int32Array.of(0, 1), dims: [0, 1] });
    expect(Number.isNaN(packed.values[0])).toBe(true);
    expect(Number.isNaN(packed.values[3])).toBe(true);
    expect(packed.values[1]).toBe(1);
  });
});

describe('packedPartitionOf(z, d, partition)', () => {
  it('packs a partition once and gives the same copy again', () => {
    const z = Float32Array.of(1, 2, 3, 4);
    const p = { rows: Int32Array.of(1), dims: [1] };
    const a = packedPartitionOf(z, 2, p);
    expect(packedPartitionOf(z, 2, p)).toBe(a);
    expect([...a.values]).toEqual([4]);
    expect(packedPartitionOf(z, 2, { rows: Int32Array.of(1), dims: [1] })).not.toBe(a);
  });
});
