import { describe, expect, it } from 'vitest';
import { embeddingModelFromJSON, modelCodeSize, modelInputSize } from '../../src/embed/EmbeddingModel.ts';
import { fitPcaEmbedding } from '../../src/embed/fitPcaEmbedding.ts';
import { Autoencoder } from '../../src/embed/Autoencoder.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';
import { StoreError } from '../../src/errors/KindredError.ts';
import { standardisedIris } from './helpers.ts';

describe('embeddingModelFromJSON(json)', () => {
  it('rebuilds a PCA embedding and an autoencoder from their JSON, encoding as before', () => {
    const data = standardisedIris();
    const row = data.x.slice(0, 4);
    const pca = fitPcaEmbedding(data, 2);
    const p = embeddingModelFromJSON(JSON.parse(JSON.stringify(pca.toJSON())));
    expect(p.space).toBe('pca');
    expect([modelInputSize(p), modelCodeSize(p)]).toEqual([4, 2]);
    expect(Array.from(p.model.encode(row))).toEqual(Array.from(pca.encode(row)));
    const ae = Autoencoder.initialise({ d: 4, hidden: [5], latent: 3, activation: 'tanh' }, new SeededRandom(2));
    const a = embeddingModelFromJSON(JSON.parse(JSON.stringify(ae.toJSON())));
    expect(a.space).toBe('autoencoder');
    expect(modelCodeSize(a)).toBe(3);
    expect(Array.from(a.model.encode(row))).toEqual(Array.from(ae.encode(row)));
  });

  it('refuses another format tag with kindred.store.corrupt', () => {
    expect(() => embeddingModelFromJSON({ format: 'something-else' })).toThrow(StoreError);
    expect(() => embeddingModelFromJSON(null)).toThrow(/expected kindred-pca-embedding or kindred-autoencoder/);
  });
});
