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
    expect(ex.alike[0]).toBe('b'); // equal and weight 2
    expect(ex.alike).toContain('e');
    expect(ex.apart[0]).toBe('c');
    expect(ex.apart).not.toContain('d');
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
