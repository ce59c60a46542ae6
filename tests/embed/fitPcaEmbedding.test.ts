import { describe, expect, it } from 'vitest';
import { fitPcaEmbedding } from '../../src/embed/fitPcaEmbedding.ts';
import { PcaEmbedding } from '../../src/embed/PcaEmbedding.ts';
import { StoreError } from '../../src/errors/KindredError.ts';
import { standardisedIris } from './helpers.ts';

describe('fitPcaEmbedding', () => {
  it('fitPcaEmbedding(standardised iris, 2) explains 72.96%, 22.85%, 3.67%, 0.52% of the variance', () => {
    // Reference: the correlation-matrix PCA of Fisher's iris data, shares widely printed (from memory:
    // eigenvalues 2.918, 0.914, 0.147, 0.021 of the 4 x 4 correlation matrix, as in R's prcomp(iris[,1:4], scale = TRUE)).
    const pca = fitPcaEmbedding(standardisedIris(), 2);
    const shares = Array.from(pca.explainedVariance, (v) => Number(v.toFixed(4)));
    expect(shares).toEqual([0.7296, 0.2285, 0.0367, 0.0052]);
  });

  it('encodes as a projection: orthonormal axes, decode(encode(x)) is idempotent, missing fed as 0', () => {
    const data = standardisedIris();
    const pca = fitPcaEmbedding(data, 2);
    const dot = (a: number, b: number): number => {
      let s = 0;
      for (let j = 0; j < 4; j++) s += (pca.components[a * 4 + j] ?? 0) * (pca.components[b * 4 + j] ?? 0);
      return s;
    };
    expect(dot(0, 0)).toBeCloseTo(1, 12);
    expect(dot(1, 1)).toBeCloseTo(1, 12);
    expect(dot(0, 1)).toBeCloseTo(0, 12);
    const x = data.x.slice(0, 4);
    const once = pca.decode(pca.encode(x));
    expect(Array.from(pca.decode(pca.encode(once)))).toEqual(Array.from(once).map((v) => expect.closeTo(v, 12)));
    expect(pca.encode(Float64Array.of(NaN, 1, 0, 0))).toEqual(pca.encode(Float64Array.of(0, 1, 0, 0)));
  });

  it('toJSON / fromJSON round-trips, and fromJSON refuses a mismatched shape with kindred.store.corrupt', () => {
    const pca = fitPcaEmbedding(standardisedIris(), 2);
    const json = JSON.parse(JSON.stringify(pca.toJSON()));
    expect(json.format).toBe('kindred-pca-embedding');
    const back = PcaEmbedding.fromJSON(json);
    expect(back.encode(Float64Array.of(1, 2, 3, 4))).toEqual(pca.encode(Float64Array.of(1, 2, 3, 4)));
    let code = '';
    try {
      PcaEmbedding.fromJSON({ ...json, k: 3 });
    } catch (e) {
      code = e instanceof StoreError ? e.code : 'other';
    }
    expect(code).toBe('kindred.store.corrupt');
  });
});
