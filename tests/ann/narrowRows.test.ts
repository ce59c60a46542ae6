import { describe, expect, it } from 'vitest';
import { narrowRows, scansWider, widerPartitions } from '../../src/ann/narrowRows.ts';

const parts = [
  { dims: [0, 1], rows: [0, 3] },
  { dims: [0, 1, 2], rows: [1, 4] },
  { dims: [0, 1, 3], rows: [2] },
  { dims: [0, 2], rows: [5] },
];

describe('widerPartitions(partitions, i)', () => {
  it('lists the partitions whose dimensions strictly include partition i’s', () => {
    expect(widerPartitions(parts, 0)).toEqual([1, 2]);
    expect(widerPartitions(parts, 3)).toEqual([1]);
    expect(widerPartitions(parts, 1)).toEqual([]);
  });

  it('does not count a partition with the same number of dimensions, nor one that lacks one', () => {
    expect(widerPartitions([{ dims: [0, 1], rows: [0] }, { dims: [0, 2], rows: [1] }], 0)).toEqual([]);
  });
});

describe('narrowRows(partitions, i)', () => {
  it('gives the worked example: the rows of the wider partitions, ascending', () => {
    expect([...narrowRows(parts, 0)]).toEqual([1, 2, 4]);
    expect([...narrowRows(parts, 3)]).toEqual([1, 4]);
  });

  it('sorts rows numerically, not as text', () => {
    expect([...narrowRows([{ dims: [0], rows: [] }, { dims: [0, 1], rows: [10, 9] }, { dims: [0, 2], rows: [100] }], 0)]).toEqual([9, 10, 100]);
  });
});

describe('scansWider(partitions, i, weights)', () => {
  it('gives the worked example: [0, 1] against [0, 1, 2] is scanned at equal weights (2/3 < 0.9), not when dim 2 weighs 0.1', () => {
    const two = [
      { dims: [0, 1], rows: [0] },
      { dims: [0, 1, 2], rows: [1] },
    ];
    expect(scansWider(two, 0, [1, 1, 1])).toBe(true);
    expect(scansWider(two, 0, [1, 1, 0.1])).toBe(false);
  });

  it('is false for a partition no other includes', () => {
    expect(scansWider(parts, 1, [1, 1, 1, 1])).toBe(false);
  });
});
