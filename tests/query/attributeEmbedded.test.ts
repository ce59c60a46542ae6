import { describe, expect, it } from 'vitest';
import { attributeEmbedded, EXACT_ATTRIBUTION_UP_TO } from '../../src/query/attributeEmbedded.ts';

describe('attributeEmbedded(encode, target, comp, seed)', () => {
  it('splits a Euclidean distance by the two-player Shapley formula (hand-worked: legs 3 and 4, phi = 2 and 3)', () => {
    // two players: phi_1 = (v(1) + v(12) - v(2)) / 2 = (3 + 5 - 4) / 2 = 2 (Shapley 1953)
    const r = attributeEmbedded((x) => x, Float64Array.of(0, 0), Float64Array.of(3, 4), 1);
    expect(r.total).toBe(5);
    expect(Array.from(r.values).map((v) => Number(v.toFixed(12)))).toEqual([2, 3]);
  });

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
});
