import { describe, expect, it } from 'vitest';
import { redundancyWeights } from '../../src/profiles/redundancyWeights.ts';

function columns(...cols: number[][]): { z: Float64Array; n: number; d: number } {
  const n = cols[0]?.length ?? 0;
  const d = cols.length;
  const z = new Float64Array(n * d);
  cols.forEach((c, j) => c.forEach((v, i) => (z[i * d + j] = v)));
  return { z, n, d };
}

const seq = (n: number, f: (i: number) => number): number[] => Array.from({ length: n }, (_, i) => f(i));
/** Independent pseudo-random columns (a 32-bit linear congruential generator, Numerical Recipes constants). */
function noise(n: number, seed: number): number[] {
  let s = seed >>> 0;
  return seq(n, () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32 - 0.5;
  });
}

describe('redundancyWeights(z, n, d)', () => {
  it('with families, counts two copies of a skill in different families as unrelated (1 each)', () => {
    const a = noise(2000, 1);
    const b = noise(2000, 2);
    const { z, n, d } = columns(a, a, b);
    const w = redundancyWeights(z, n, d, undefined, 30, [0, 1, 1]);
    expect(w[0]).toBeGreaterThan(0.95);
    expect(w[1]).toBeGreaterThan(0.95);
    expect(w[2]).toBeGreaterThan(0.95);
    const same = redundancyWeights(z, n, d, undefined, 30, [0, 0, 1]);
    expect(same[0]).toBeCloseTo(0.5, 1);
  });

  it('splits weight 1 between two copies of a skill and leaves an unrelated dimension at 1', () => {
    const a = noise(2000, 1);
    const b = noise(2000, 2);
    const { z, n, d } = columns(a, a, b);
    const w = redundancyWeights(z, n, d);
    expect(w[0]).toBeCloseTo(0.5, 1);
    expect(w[1]).toBeCloseTo(0.5, 1);
    expect(w[2]).toBeGreaterThan(0.95);
  });

  it('gives three copies a third each', () => {
    const a = seq(300, (i) => Math.sin(i * 1.7));
    const { z, n, d } = columns(a, a, a);
    const w = redundancyWeights(z, n, d);
    for (let j = 0; j < 3; j++) expect(w[j], `copy ${j}`).toBeCloseTo(1 / 3, 6);
  });

  it('treats pairs with too few shared rows as unrelated', () => {
    const a = seq(100, (i) => Math.sin(i));
    const b = a.map((x, i) => (i < 10 ? x : NaN));
    const { z, n, d } = columns(a, b);
    const w = redundancyWeights(z, n, d, Float64Array.from([1, 1]), 30);
    expect(w[0]).toBe(1);
    expect(w[1]).toBe(1);
  });
});

describe('redundancyWeights(z, n, d, reliability)', () => {
  it('weighs a noisy dimension down by its reliability squared', () => {
    const a = noise(2000, 3);
    const b = noise(2000, 4);
    const { z, n, d } = columns(a, b);
    const w = redundancyWeights(z, n, d, Float64Array.from([1, 0.5]));
    expect(w[0]).toBeGreaterThan(0.95);
    expect(w[1]).toBeCloseTo(0.25, 1);
  });

  it('corrects correlations for attenuation: two noisy measures of one skill share its weight', () => {
    // x and y: the same skill plus independent noise of equal size, so r = 0.5 and each reliability 0.5;
    // corrected for attenuation they are one skill (rho' = 1), so w = 0.25 / 2 each.
    const skill = noise(20000, 5);
    const e1 = noise(20000, 6);
    const e2 = noise(20000, 7);
    const x = skill.map((s, i) => s + (e1[i] as number));
    const y = skill.map((s, i) => s + (e2[i] as number));
    const { z, n, d } = columns(x, y);
    const w = redundancyWeights(z, n, d, Float64Array.from([0.5, 0.5]));
    expect(w[0]).toBeCloseTo(0.125, 2);
    expect(w[1]).toBeCloseTo(0.125, 2);
  });
});
