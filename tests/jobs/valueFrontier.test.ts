import { describe, expect, it } from 'vitest';
import { valueFrontier } from '../../src/jobs/valueFrontier.ts';

const beats = (l: number[], s: number[], j: number, i: number): boolean =>
  (l[j] as number) >= (l[i] as number) && (s[j] as number) <= (s[i] as number) && ((l[j] as number) > (l[i] as number) || (s[j] as number) < (s[i] as number));

describe('valueFrontier(likeness, salary)', () => {
  it('gives the doc example: the 70 paid 2M is beaten by the 80 paid 1M', () => {
    expect(valueFrontier([90, 80, 70], [5e6, 1e6, 2e6])).toEqual([true, true, false]);
  });
  it('keeps equal pairs on the frontier (neither beats the other)', () => {
    expect(valueFrontier([80, 80], [1e6, 1e6])).toEqual([true, true]);
  });
  it('drops a comp that is as alike but paid more, or as paid but less alike', () => {
    expect(valueFrontier([80, 80, 75], [1e6, 2e6, 1e6])).toEqual([true, false, false]);
  });
  it('is the Pareto set on random lists: no frontier comp is beaten, every other comp is beaten by a frontier comp', () => {
    let seed = 7;
    const next = (): number => {
      seed = (seed * 1103515245 + 12345) % 2147483648; // common LCG constants (from memory)
      return seed / 2147483648;
    };
    for (let trial = 0; trial < 50; trial++) {
      const n = 1 + Math.floor(next() * 20);
      const l = Array.from({ length: n }, () => Math.round(next() * 20) * 5);
      const s = Array.from({ length: n }, () => Math.round(next() * 10) * 1e6);
      const f = valueFrontier(l, s);
      for (let i = 0; i < n; i++) {
        const beaten = l.some((_, j) => j !== i && beats(l, s, j, i));
        expect(f[i]).toBe(!beaten);
        if (!f[i]) expect(l.some((_, j) => f[j] && beats(l, s, j, i))).toBe(true);
      }
    }
  });
});
