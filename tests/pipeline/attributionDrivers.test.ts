import { describe, expect, it } from 'vitest';
import { attributionDrivers } from '../../src/pipeline/attributionDrivers.ts';
import { inventedProfiles } from '../embed/helpers.ts';

describe('attributionDrivers(input, targets, comps, seed)', () => {
  const data = inventedProfiles(240, 4, { missing: 0.1, perPlayer: 3, seed: 21 });
  const z = Float32Array.from(data.x);
  const codes = Float64Array.from(z, (v) => (Number.isNaN(v) ? 0 : v)); // identity encoder, missing as 0
  const input = {
    encode: (x: Float64Array) => Float64Array.from(x, (v) => (Number.isNaN(v) ? 0 : v)),
    z,
    codes,
    n: data.n,
    d: data.d,
    dim: data.d,
    players: data.groups,
    names: ['a', 'b', 'c', 'd'],
  };

  it('attributes `comps` comps for each of `targets` targets, and counts each dimension where both sides have it', () => {
    const r = attributionDrivers(input, 12, 5, 3);
    expect([r.targets, r.comps]).toEqual([12, 60]);
    const perDimension = new Map<string, number>();
    for (const row of r.rows) perDimension.set(row.dimension, (perDimension.get(row.dimension) ?? 0) + 1);
    for (const x of r.dims) {
      expect(x.count).toBe(perDimension.get(x.name) ?? 0);
      expect(x.count).toBeLessThanOrEqual(60);
      expect(x.min).toBeLessThanOrEqual(x.q1);
      expect(x.q1).toBeLessThanOrEqual(x.median);
      expect(x.median).toBeLessThanOrEqual(x.q3);
      expect(x.q3).toBeLessThanOrEqual(x.max);
      expect(x.mean_abs).toBeGreaterThanOrEqual(Math.abs(x.mean) - 1e-12);
    }
  });

  it('is reproducible for a seed, and draws other targets for another seed', () => {
    const a = attributionDrivers(input, 6, 3, 1);
    expect(attributionDrivers(input, 6, 3, 1).rows).toEqual(a.rows);
    expect(attributionDrivers(input, 6, 3, 2).rows).not.toEqual(a.rows);
  });

  it('gives zeros and no rows for no targets', () => {
    const r = attributionDrivers(input, 0, 10, 1);
    expect(r.rows).toEqual([]);
    expect(r.dims.map((x) => [x.count, x.mean_abs])).toEqual([[0, 0], [0, 0], [0, 0], [0, 0]]);
  });
});
