import { describe, expect, it } from 'vitest';
import { sampleByPlayer } from '../../src/embed/sampleByPlayer.ts';

describe('sampleByPlayer(groups, maxRows, seed)', () => {
  it('takes every row when they fit', () => {
    expect(Array.from(sampleByPlayer(['a', 'a', 'b', 'c'], 10, 1))).toEqual([0, 1, 2, 3]);
  });

  it('takes whole players only, never more than maxRows, in ascending row order', () => {
    const groups = Array.from({ length: 300 }, (_, i) => `p${Math.floor(i / 3)}`); // 100 players x 3 rows
    const rows = Array.from(sampleByPlayer(groups, 50, 7));
    expect(rows.length).toBeLessThanOrEqual(50);
    expect(rows.length).toBeGreaterThanOrEqual(48);
    expect(rows).toEqual([...rows].sort((a, b) => a - b));
    const taken = new Set(rows.map((r) => groups[r]));
    for (const p of taken) expect(rows.filter((r) => groups[r] === p).length).toBe(3);
  });

  it('is the same for a seed whatever the order of the rows', () => {
    const groups = ['a', 'b', 'a', 'c', 'd', 'b', 'e', 'f'];
    const reversed = [...groups].reverse();
    const pick = (g: string[]): string[] => [...new Set(Array.from(sampleByPlayer(g, 4, 3)).map((r) => g[r] ?? ''))].sort();
    expect(pick(reversed)).toEqual(pick(groups));
  });
});
