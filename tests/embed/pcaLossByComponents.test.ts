import { describe, expect, it } from 'vitest';
import { PCA } from 'ml-pca';
import { fitPcaEmbedding } from '../../src/embed/fitPcaEmbedding.ts';
import { PcaEmbedding } from '../../src/embed/PcaEmbedding.ts';
import { pcaLossByComponents } from '../../src/embed/pcaLossByComponents.ts';
import { standardisedIris } from './helpers.ts';

describe('pcaLossByComponents(pca, data, rows)', () => {
  it('on complete data equals the share of variance left out, as ml-pca reports it (iris)', () => {
    // with no missing entry, the mean squared reconstruction error over all n*d entries with q
    // components is (n - 1) / n * sum of the eigenvalues after the q-th, divided by d
    const data = standardisedIris();
    const pca = fitPcaEmbedding(data, data.d);
    const loss = pcaLossByComponents(pca, data, Int32Array.from({ length: data.n }, (_, i) => i));
    const rows = Array.from({ length: data.n }, (_, i) => Array.from(data.x.subarray(i * data.d, (i + 1) * data.d)));
    const eigen = new PCA(rows, { center: true, scale: false }).getEigenvalues(); // sample covariance (n - 1)
    for (let q = 1; q <= data.d; q++) {
      const left = eigen.slice(q).reduce((a, b) => a + b, 0);
      expect(loss[q - 1]).toBeCloseTo(((data.n - 1) / data.n) * (left / data.d), 10);
    }
  });

  it('matches PcaEmbedding.reconstructionError of the truncated model, missing entries left out', () => {
    const data = standardisedIris();
    const x = data.x.slice();
    for (let i = 0; i < x.length; i += 7) x[i] = NaN;
    const gappy = { ...data, x };
    const full = fitPcaEmbedding(gappy, gappy.d);
    const loss = pcaLossByComponents(full, gappy, Int32Array.from({ length: gappy.n }, (_, i) => i));
    const two = new PcaEmbedding(gappy.d, 2, full.mean, full.components.slice(0, 2 * gappy.d), full.explainedVariance);
    expect(loss[1]).toBeCloseTo(two.reconstructionError(gappy), 12);
  });

  it('is NaN for no rows', () => {
    const data = standardisedIris();
    expect(Number.isNaN(pcaLossByComponents(fitPcaEmbedding(data, 2), data, new Int32Array(0))[0])).toBe(true);
  });
});
