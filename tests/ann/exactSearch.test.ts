import { distance } from 'ml-distance';
import { describe, expect, it } from 'vitest';
import { KindredError } from '../../src/errors/KindredError.ts';
import { exactSearch } from '../../src/ann/exactSearch.ts';
import { randomVectors, row } from './randomVectors.ts';

describe('exactSearch(vectors, dim, query, k, filter)', () => {
  it('returns the worked example of its doc comment (squared distances 0, 1; 3-4-5 triangle gives 25)', () => {
    const vectors = new Float32Array([0, 0, 1, 0, 3, 4]);
    expect(exactSearch(vectors, 2, [0, 0], 2)).toEqual({ labels: [0, 1], distances: [0, 1] });
    expect(exactSearch(vectors, 2, [0, 0], 3).distances).toEqual([0, 1, 25]);
  });

  it('agrees with ml-distance squaredEuclidean over a full sort (reference library)', () => {
    const dim = 6;
    const vectors = randomVectors(500, dim, 11);
    const query = row(randomVectors(1, dim, 12), dim, 0);
    const reference = Array.from({ length: 500 }, (_, i) => ({ i, d: distance.squaredEuclidean(row(vectors, dim, i), query) }))
      .sort((a, b) => a.d - b.d || a.i - b.i)
      .slice(0, 15);
    const hits = exactSearch(vectors, dim, query, 15);
    expect(hits.labels).toEqual(reference.map((r) => r.i));
    hits.distances.forEach((d, n) => expect(d).toBeCloseTo(reference[n]?.d ?? NaN, 9));
  });

  it('keeps only labels the filter accepts and clamps k to the rows left', () => {
    const vectors = new Float32Array([0, 1, 2, 3, 4, 5]);
    const hits = exactSearch(vectors, 1, [0], 10, (label) => label % 2 === 1);
    expect(hits.labels).toEqual([1, 3, 5]);
  });

  it('breaks ties by the smaller label', () => {
    expect(exactSearch(new Float32Array([1, -1, 1]), 1, [0], 3).labels).toEqual([0, 1, 2]);
  });

  it('refuses a wrong-length or NaN query and a non-finite row', () => {
    const vectors = new Float32Array([0, 0, 1, 1]);
    expect(() => exactSearch(vectors, 2, [0], 1)).toThrow(expect.objectContaining({ code: 'kindred.index.badVector' }));
    expect(() => exactSearch(vectors, 2, [0, NaN], 1)).toThrow(KindredError);
    expect(() => exactSearch(new Float32Array([0, 0, NaN, 1]), 2, [0, 0], 2)).toThrow(/row 1/);
  });

  it('returns nothing for k = 0 and refuses a negative or fractional k', () => {
    expect(exactSearch(new Float32Array([1, 2]), 1, [0], 0)).toEqual({ labels: [], distances: [] });
    expect(() => exactSearch(new Float32Array([1, 2]), 1, [0], -1)).toThrow(/k is -1/);
    expect(() => exactSearch(new Float32Array([1, 2]), 1, [0], 1.5)).toThrow(/k is 1.5/);
  });
});
