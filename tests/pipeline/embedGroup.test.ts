import { describe, expect, it } from 'vitest';
import { PCA } from 'ml-pca';
import { embedGroup } from '../../src/pipeline/embedGroup.ts';
import { resolveEmbedSettings } from '../../src/pipeline/EmbedSettings.ts';
import { chooseComponents } from '../../src/embed/chooseComponents.ts';
import { splitByPlayer } from '../../src/embed/splitByPlayer.ts';
import { UsageError } from '../../src/errors/KindredError.ts';
import { inventedProfiles, standardisedIris } from '../embed/helpers.ts';

describe('embedGroup(data, settings)', () => {
  it('PCA keeps the fewest components reaching the variance share, as ml-pca measures it on the training players', () => {
    const data = inventedProfiles(600, 8, { factors: 3, missing: 0, seed: 5 });
    const settings = resolveEmbedSettings({ method: 'pca', pcaVariance: 0.8, seed: 2 });
    const e = embedGroup(data, settings);
    const split = splitByPlayer(data.groups, settings.autoencoder.valFraction, settings.seed);
    const rows = Array.from(split.train, (i) => Array.from(data.x.subarray(i * data.d, (i + 1) * data.d)));
    const expected = chooseComponents(new PCA(rows, { center: true, scale: false }).getExplainedVariance(), 0.8);
    expect(e.dim).toBe(expected);
    expect(e.rows.filter((r) => r.chosen).map((r) => r.size)).toEqual([expected]);
    expect(e.rows.map((r) => r.size)).toEqual([1, 2, 3, 4, 5, 6, 7]); // capped at d - 1
    const explained = e.rows.map((r) => r.explained ?? NaN);
    expect(explained).toEqual([...explained].sort((a, b) => a - b));
    const train = e.rows.map((r) => r.train_loss ?? NaN);
    expect(train).toEqual([...train].sort((a, b) => b - a)); // more components never reconstruct worse
    expect(e.codes.length).toBe(data.n * e.dim);
    expect(e.kept).toBeNull();
  });

  it('the autoencoder search trains each size on a sample of whole players, then the chosen size on every row', () => {
    const data = inventedProfiles(900, 6, { factors: 2, seed: 9 });
    const settings = resolveEmbedSettings({ method: 'autoencoder', seed: 3, autoencoder: { maxEpochs: 3, searchRows: 300, margin: 0 } });
    const e = embedGroup(data, settings);
    expect(e.searchRows).toBeLessThanOrEqual(300);
    expect(e.rows.map((r) => r.size)).toEqual([2, 3, 4]); // the ladder below d = 6, latent 6 and 8 left out
    expect(e.histories.length).toBe(e.rows.length + 1);
    expect(e.kept?.size).toBe(e.dim);
    expect(e.kept?.history.train.length).toBeLessThanOrEqual(3);
    expect(e.rule).toContain('then trained on every row');
  });

  it('gives the same codes twice for a seed, and other codes for another seed', () => {
    const data = standardisedIris();
    const s = (seed: number) => resolveEmbedSettings({ method: 'autoencoder', seed, autoencoder: { latent: 2, maxEpochs: 5 } });
    const a = embedGroup(data, s(4));
    expect(Array.from(embedGroup(data, s(4)).codes)).toEqual(Array.from(a.codes));
    expect(Array.from(embedGroup(data, s(5)).codes)).not.toEqual(Array.from(a.codes));
    expect(a.rule).toBe('fixed latent size 2');
  });

  it('the cross-season objective trains on pairs of a row and the same player\'s other season, then encodes every row', () => {
    const data = inventedProfiles(300, 6, { factors: 2, perPlayer: 3, seed: 9 });
    const seasons = data.groups.map((_, i) => 2020 + (i % 3));
    const settings = resolveEmbedSettings({ method: 'autoencoder', seed: 3, autoencoder: { objective: 'cross-season', latent: 2, maxEpochs: 3 } });
    const e = embedGroup(data, settings, seasons);
    // three seasons a player: the middle one pairs with both others, the first and last with the middle
    expect(e.rule).toBe('cross-season objective (400 pairs: a row and the same player\'s nearest other season); fixed latent size 2; code distances made the decoder\'s (isometric code)');
    expect(e.searchRows).toBe(400);
    expect(e.codes.length).toBe(300 * 2);
    const plain = embedGroup(data, resolveEmbedSettings({ method: 'autoencoder', seed: 3, autoencoder: { latent: 2, maxEpochs: 3 } }));
    expect(Array.from(e.codes)).not.toEqual(Array.from(plain.codes));
    expect(() => embedGroup(data, settings)).toThrow(/season/);
  });

  it('the cross-season objective falls back to reconstruction, and says so, when players have too few other seasons', () => {
    const data = inventedProfiles(60, 6, { factors: 2, perPlayer: 1, seed: 9 });
    const settings = resolveEmbedSettings({ method: 'autoencoder', seed: 3, autoencoder: { objective: 'cross-season', latent: 2, maxEpochs: 2 } });
    const e = embedGroup(data, settings, data.groups.map(() => 2020));
    expect(e.rule).toBe('fixed latent size 2 (reconstruction: 0 cross-season pairs, fewer than 40)');
  });

  it('refuses a group with one dimension', () => {
    const data = { x: Float64Array.of(1, 2, 3, 4), n: 4, d: 1, groups: ['a', 'b', 'c', 'd'] };
    expect(() => embedGroup(data, resolveEmbedSettings({ method: 'pca' }))).toThrow(UsageError);
  });
});
