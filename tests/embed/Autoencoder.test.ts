import { describe, expect, it } from 'vitest';
import { Autoencoder } from '../../src/embed/Autoencoder.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';
import { StoreError } from '../../src/errors/KindredError.ts';

const model = Autoencoder.initialise({ d: 5, hidden: [6, 4], latent: 2, activation: 'relu' }, new SeededRandom(4));
const row = Float64Array.from([0.3, NaN, -1.2, 2.0, 0.1]);

function codeOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    return e instanceof StoreError ? e.code : 'not a StoreError';
  }
  return undefined;
}

describe('Autoencoder', () => {
  it('encode gives latent numbers and feeds a missing input as 0', () => {
    const zeroed = row.slice();
    zeroed[1] = 0;
    expect(model.encode(row)).toHaveLength(2);
    expect(model.encode(row)).toEqual(model.encode(zeroed));
    expect(model.decode(model.encode(row))).toHaveLength(5);
  });

  it('toJSON / fromJSON round-trips exactly through JSON text', () => {
    const json = model.toJSON();
    expect(json.format).toBe('kindred-autoencoder');
    expect(json.version).toBe(1);
    const back = Autoencoder.fromJSON(JSON.parse(JSON.stringify(json)));
    expect(back.encode(row)).toEqual(model.encode(row));
    expect(back.toJSON()).toEqual(json);
  });

  it('fromJSON refuses a wrong tag, a wrong layer shape or a non-number with kindred.store.corrupt', () => {
    const json = model.toJSON();
    expect(codeOf(() => Autoencoder.fromJSON({ ...json, format: 'other' }))).toBe('kindred.store.corrupt');
    expect(codeOf(() => Autoencoder.fromJSON({ ...json, layers: json.layers.slice(1) }))).toBe('kindred.store.corrupt');
    const shortWeights = json.layers.map((l, i) => (i === 2 ? { ...l, weights: l.weights.slice(1) } : l));
    expect(codeOf(() => Autoencoder.fromJSON({ ...json, layers: shortWeights }))).toBe('kindred.store.corrupt');
    const wrongLatent = { ...json, latent: 3 };
    expect(codeOf(() => Autoencoder.fromJSON(wrongLatent))).toBe('kindred.store.corrupt');
    const text = JSON.parse(JSON.stringify(json).replace(/"bias":\[/, '"bias":["x",'));
    expect(codeOf(() => Autoencoder.fromJSON(text))).toBe('kindred.store.corrupt');
    expect(codeOf(() => Autoencoder.fromJSON(null))).toBe('kindred.store.corrupt');
  });

  it('fromJSON refuses another format version with kindred.store.version', () => {
    expect(codeOf(() => Autoencoder.fromJSON({ ...model.toJSON(), version: 2 }))).toBe('kindred.store.version');
  });
});
