import { describe, expect, it } from 'vitest';
import { Autoencoder } from '../../src/embed/Autoencoder.ts';
import { isometricCode } from '../../src/embed/isometricCode.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';

const rng = new SeededRandom(21);
const rows = Array.from({ length: 6 }, () => Float64Array.from({ length: 5 }, () => rng.normal()));
const dist = (a: Float64Array, b: Float64Array): number => Math.sqrt(a.reduce((s, v, i) => s + (v - (b[i] ?? 0)) ** 2, 0));

describe('isometricCode(model)', () => {
  it('keeps what the network computes: decode(encode(x)) unchanged (linear and tanh)', () => {
    for (const shape of [{ hidden: [], activation: 'identity' }, { hidden: [4], activation: 'tanh' }] as const) {
      const model = Autoencoder.initialise({ d: 5, hidden: [...shape.hidden], latent: 3, activation: shape.activation }, new SeededRandom(3));
      const iso = isometricCode(model);
      for (const x of rows) {
        const a = model.reconstruct(x);
        const b = iso.reconstruct(x);
        for (let j = 0; j < 5; j++) expect(b[j]).toBeCloseTo(a[j] ?? NaN, 10);
      }
    }
  });

  it('with no hidden layer, the distance between two codes is the distance between the two decoded profiles', () => {
    // Property of the construction: W W' = L L' gives ||(c1 - c2) L|| = ||(c1 - c2) W||, and the decoder is
    // linear, so that is || decode(c1) - decode(c2) ||. The raw code of a trained or random model is not.
    const model = Autoencoder.initialise({ d: 5, hidden: [], latent: 3, activation: 'identity' }, new SeededRandom(4));
    const iso = isometricCode(model);
    let rawGap = 0;
    for (let i = 1; i < rows.length; i++) {
      const [x1, x2] = [rows[0] as Float64Array, rows[i] as Float64Array];
      const decoded = dist(model.reconstruct(x1), model.reconstruct(x2));
      expect(dist(iso.encode(x1), iso.encode(x2))).toBeCloseTo(decoded, 10);
      rawGap = Math.max(rawGap, Math.abs(dist(model.encode(x1), model.encode(x2)) - decoded));
    }
    expect(rawGap).toBeGreaterThan(0.01);
  });

  it('leaves a model whose decoder ignores a code unit as it is', () => {
    const model = Autoencoder.initialise({ d: 4, hidden: [], latent: 2, activation: 'identity' }, new SeededRandom(5));
    model.layers[1]?.weights.fill(0, 0, 4);
    expect(isometricCode(model)).toBe(model);
  });
});
