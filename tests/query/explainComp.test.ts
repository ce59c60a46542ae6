import { describe, expect, it } from 'vitest';
import { explainComp } from '../../src/query/explainComp.ts';
import type { DimensionInfo } from '../../src/profiles/Dimension.ts';

const dim = (name: string, direction: DimensionInfo['direction'] = 'higher'): DimensionInfo => ({
  name, label: name.toUpperCase(), unit: 'u', direction, meaning: '', source: '', skill: name, family: 'power', scope: 'group', digits: 3, stabilisation: 0,
});
const dims = [dim('a'), dim('b', 'lower'), dim('c'), dim('d'), dim('e')];

describe('explainComp(dims, weights, target, comp)', () => {
  it('splits the weighted squared distance into shares that sum to 1 (missing dimensions get 0)', () => {
    const w = Float64Array.from([1, 2, 1, 1, 1]);
    const tz = Float64Array.from([0, 1, 2, NaN, 0]);
    const cz = Float32Array.from([1, 1, 0, 3, 0.5]);
    const ex = explainComp(dims, w, tz, tz, cz, cz, 0);
    const shares = ex.dimensions.map((x) => x.share);
    expect(shares.reduce((s, x) => s + x, 0)).toBeCloseTo(1, 12);
    // parts: a 1, b 0, c 4, e 0.25 -> total 5.25
    expect(shares[0]).toBeCloseTo(1 / 5.25, 12);
    expect(shares[2]).toBeCloseTo(4 / 5.25, 12);
    expect(ex.dimensions[3]?.missing).toBe(true);
    expect(ex.dimensions[3]?.share).toBe(0);
  });

  it('names the heaviest close matches alike and the largest differences apart', () => {
    const w = Float64Array.from([1, 2, 1, 1, 1]);
    const tz = Float64Array.from([0, 1, 2, NaN, 0]);
    const cz = Float32Array.from([1, 1, 0, 3, 0.5]);
    const ex = explainComp(dims, w, tz, tz, cz, cz, 0);
    expect(ex.alike).toEqual(['b', 'e']); // b equal and weight 2; e grades 50 vs 55, a gap of 5 (the limit)
    expect(ex.apart).toEqual(['c', 'a']); // gaps 20 and 10 grade points, by share
    expect(ex.apart).not.toContain('d');
  });

  it('never calls a 27-point gap alike nor a 2-point gap apart (the catcher case: OBP 72 vs 45, K% 52 vs 54)', () => {
    // grades 72 / 45 on a (OBP), 48 / 46 on b (K%, lower is better), 60 / 60 on c; nothing else close
    const w = Float64Array.from([1, 0.01, 1, 1, 1]);
    const tz = Float64Array.from([2.2, 0.2, 1, 3, -3]);
    const cz = Float32Array.from([-0.5, 0.4, 1, 0, 0]);
    const ex = explainComp(dims, w, tz, tz, cz, cz, 0);
    const gap = (n: string): number => {
      const x = ex.dimensions.find((d) => d.name === n);
      return Math.abs((x?.target_grade ?? 0) - (x?.comp_grade ?? 0));
    };
    expect(gap('a')).toBe(27);
    expect(gap('b')).toBe(2);
    expect(ex.alike).not.toContain('a');
    expect(ex.apart).not.toContain('b');
    expect(ex.alike).toEqual(['c', 'b']);
    for (const n of ex.alike) expect(gap(n)).toBeLessThanOrEqual(5);
    for (const n of ex.apart) expect(gap(n)).toBeGreaterThanOrEqual(10);
  });

  it('orients grades so higher is better (a lower-is-better dimension at z = +1 grades 40; common practice)', () => {
    const w = Float64Array.from([1, 1, 1, 1, 1]);
    const tz = Float64Array.from([1, 1, 0, 0, 0]);
    const ex = explainComp(dims, w, tz, tz, Float32Array.from(tz), Float32Array.from(tz), 0);
    expect(ex.dimensions[0]?.target_grade).toBe(60);
    expect(ex.dimensions[1]?.target_grade).toBe(40);
  });

  it('shares follow the weights when the profiles are identical', () => {
    const w = Float64Array.from([1, 3, 0, 0, 0]);
    // values exactly representable in float32, as the store holds them
    const tz = Float64Array.from([0.25, 0.5, 0, 0, 0]);
    const ex = explainComp(dims, w, tz, tz, Float32Array.from(tz), Float32Array.from(tz), 0);
    expect(ex.dimensions[0]?.share).toBeCloseTo(0.25, 12);
    expect(ex.dimensions[1]?.share).toBeCloseTo(0.75, 12);
  });
});

describe('explainComp alike', () => {
  it('ranks a close match far from average above an equally weighted close match at average', () => {
    const w = Float64Array.from([1, 1, 1, 1, 1]);
    const tz = Float64Array.from([0, 2, 0, 0, 0]);
    const cz = Float32Array.from([0.1, 2.1, 3, 3, 3]);
    const ex = explainComp(dims, w, tz, tz, cz, cz, 0);
    expect(ex.alike.slice(0, 2)).toEqual(['b', 'a']);
  });
});
