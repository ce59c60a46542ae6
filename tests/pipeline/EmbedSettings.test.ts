import { describe, expect, it } from 'vitest';
import { resolveEmbedSettings } from '../../src/pipeline/EmbedSettings.ts';
import { UsageError } from '../../src/errors/KindredError.ts';

describe('resolveEmbedSettings(input)', () => {
  it('fills in the documented defaults: no embedding (README: "the default is --embed none"), 90% variance for PCA, latent search (docs/embedding.md options table)', () => {
    const s = resolveEmbedSettings();
    expect([s.method, s.pcaVariance, s.autoencoder.latent]).toEqual(['none', 0.9, 'search']);
  });

  it('keeps given autoencoder settings and the defaults of the others', () => {
    const s = resolveEmbedSettings({ method: 'autoencoder', autoencoder: { latent: 5, dropout: 0 } });
    expect([s.autoencoder.latent, s.autoencoder.dropout, s.autoencoder.batchSize]).toEqual([5, 0, 256]);
  });

  it.each([
    [{ pcaVariance: 0 }, /pcaVariance 0/],
    [{ autoencoder: { latent: 0 } }, /latent 0/],
    [{ autoencoder: { learningRate: -1 } }, /learningRate -1/],
    [{ autoencoder: { hidden: [8, 8, 8] } }, /hidden/],
    [{ driverComps: 0 }, /driverComps 0/],
  ])('refuses %j with a UsageError naming the setting', (input, message) => {
    expect(() => resolveEmbedSettings(input)).toThrow(UsageError);
    expect(() => resolveEmbedSettings(input)).toThrow(message);
  });
});
