import { describe, expect, it } from 'vitest';
import { attributeEmbedded, EXACT_ATTRIBUTION_UP_TO } from '../../src/query/attributeEmbedded.ts';

describe('attributeEmbedded(encode, target, comp, seed)', () => {
  it('splits a Euclidean distance by the two-player Shapley formula (hand-worked: legs 3 and 4, phi = 2 and 3)', () => {
    // two players: phi_1 = (v(1) + v(12) - v(2)) / 2 = (3 + 5 - 4) / 2 = 2 (Shapley 1953)
    const r = attributeEmbedded((x) => x, Float64Array.of(0, 0), Float64Array.of(3, 4), 1);
    expect(r.total).toBe(5);
    expect(Array.from(r.values).map((v) => Number(v.toFixed(12)))).toEqual([2, 3]);
  });

/**
 * Shapley values by their definition (Shapley 1953): phi_i = sum over coalitions S without i of
 * |S|! (n - |S| - 1)! / n! * (v(S + i) - v(S)), with v(S) the distance between the target's code and the
 * code of the target with the dimensions in S set to the comp's values. Written here from the formula,
 * independently of src/embed.
 */
function shapleyByDefinition(encode: (x: Float64Array) => Float64Array, target: Float64Array, comp: Float64Array): number[] {
  const n = target.length;
  const base = encode(target);
  const value = new Float64Array(1 << n);
  for (let mask = 0; mask < 1 << n; mask++) {
    const mix = Float64Array.from(target, (t, j) => (mask & (1 << j) ? (comp[j] ?? NaN) : t));
    const code = encode(mix);
    value[mask] = Math.hypot(...Array.from(code, (c, q) => c - (base[q] ?? 0)));
  }
  const factorial = (k: number): number => (k <= 1 ? 1 : k * factorial(k - 1));
  const bits = (m: number): number => (m === 0 ? 0 : (m & 1) + bits(m >>> 1));
  const phi = new Array<number>(n).fill(0);
  for (let mask = 0; mask < 1 << n; mask++) {
    const size = bits(mask);
    const share = (factorial(size) * factorial(n - size - 1)) / factorial(n);
    for (let i = 0; i < n; i++) {
      if (mask & (1 << i)) continue;
      phi[i] = (phi[i] ?? 0) + share * ((value[mask | (1 << i)] ?? 0) - (value[mask] ?? 0));
    }
  }
  return phi;
}

  it('is exact up to the limit and sampled beyond it, summing to the total either way, reproducibly', () => {
    const d = EXACT_ATTRIBUTION_UP_TO + 3;
    const encode = (x: Float64Array): Float64Array => Float64Array.of(x.reduce((a, v, j) => a + (Number.isNaN(v) ? 0 : v * (j + 1)), 0), Math.tanh(x[0] ?? 0));
    const target = new Float64Array(d);
    const comp = Float64Array.from({ length: d }, (_, j) => Math.cos(j));
    const small = attributeEmbedded(encode, target.subarray(0, EXACT_ATTRIBUTION_UP_TO), comp.subarray(0, EXACT_ATTRIBUTION_UP_TO), 1);
    expect(small.method).toBe('exact');
    const big = attributeEmbedded(encode, target, comp, 7);
    expect(big.method).toBe('sampled');
    expect(big.values.reduce((a, b) => a + b, 0)).toBeCloseTo(big.total, 10);
    expect(Math.max(...big.standardError)).toBeGreaterThan(0);
    expect(Array.from(attributeEmbedded(encode, target, comp, 7).values)).toEqual(Array.from(big.values));
  });

  it('agrees with Shapley values by definition: exactly up to the limit, within four standard errors beyond it', () => {
    const d = EXACT_ATTRIBUTION_UP_TO + 2;
    const encode = (x: Float64Array): Float64Array =>
      Float64Array.of(x.reduce((a, v, j) => a + v * (j + 1), 0) / d, Math.tanh(x[0] ?? 0) + Math.tanh((x[1] ?? 0) * (x[2] ?? 0)), Math.sin(x[d - 1] ?? 0));
    const target = Float64Array.from({ length: d }, (_, j) => Math.sin(j));
    const comp = Float64Array.from({ length: d }, (_, j) => Math.cos(2 * j));
    const small = attributeEmbedded(encode, target.subarray(0, EXACT_ATTRIBUTION_UP_TO), comp.subarray(0, EXACT_ATTRIBUTION_UP_TO), 1);
    const smallEncode = (x: Float64Array): Float64Array => {
      const full = Float64Array.from(target);
      full.set(x);
      return encode(full);
    };
    const smallRef = shapleyByDefinition(smallEncode, target.subarray(0, EXACT_ATTRIBUTION_UP_TO), comp.subarray(0, EXACT_ATTRIBUTION_UP_TO));
    smallRef.forEach((phi, j) => expect(small.values[j], `exact dimension ${j}`).toBeCloseTo(phi, 9));
    const big = attributeEmbedded(encode, target, comp, 3);
    expect(big.method).toBe('sampled');
    const ref = shapleyByDefinition(encode, target, comp);
    ref.forEach((phi, j) => expect(Math.abs((big.values[j] ?? NaN) - phi), `sampled dimension ${j}`).toBeLessThanOrEqual(4 * (big.standardError[j] ?? 0) + 1e-9));
    // the sampling error is a few percent of the distance, as the module states, not a free pass
    expect(Math.max(...big.standardError)).toBeLessThan(0.1 * big.total);
  });
});
