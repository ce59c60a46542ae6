import { describe, expect, it } from 'vitest';
import { attributeDistance } from '../../src/embed/attributeDistance.ts';
import { Autoencoder } from '../../src/embed/Autoencoder.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';
import { embeddedDistanceGame } from '../../src/embed/embeddedDistanceGame.ts';

// A non-linear encoder with random (seeded) weights: the properties below hold for any encoder.
const model = Autoencoder.initialise({ d: 8, hidden: [6], latent: 3, activation: 'tanh' }, new SeededRandom(21));
const encode = (x: Float64Array): Float64Array => model.encode(x);
const distance = (a: Float64Array, b: Float64Array): number => Math.hypot(...Array.from(encode(a), (v, i) => v - (encode(b)[i] ?? 0)));
const target = Float64Array.from([0.4, -1.1, 0.9, 0.0, 1.7, -0.3, 0.6, -2.0]);
const comp = Float64Array.from([-0.8, 0.5, 0.9, 1.2, -0.4, 1.1, -1.5, 0.3]); // dimension 2 equal to the target

describe('embeddedDistanceGame', () => {
  it('v(empty) = 0 and v(all) = the embedded distance', () => {
    const v = embeddedDistanceGame(encode, target, comp);
    expect(v(new Uint8Array(8))).toBe(0);
    expect(v(new Uint8Array(8).fill(1))).toBeCloseTo(distance(target, comp), 12);
  });

  it('a dimension missing on either side is a dummy: adding it never changes v', () => {
    const withGap = comp.slice();
    withGap[4] = NaN;
    const v = embeddedDistanceGame(encode, target, withGap);
    const c = Uint8Array.from([1, 0, 1, 1, 0, 0, 1, 0]);
    const c4 = c.slice();
    c4[4] = 1;
    expect(v(c4)).toBe(v(c));
  });
});

describe('attributeDistance', () => {
  it('attributions sum to the embedded distance, and an equal dimension gets 0 (exact)', () => {
    const r = attributeDistance(encode, target, comp);
    expect(r.method).toBe('exact');
    expect(r.players).toBe(7);
    expect(r.values[2]).toBe(0);
    expect(r.values.reduce((s, v) => s + v, 0)).toBeCloseTo(distance(target, comp), 12);
    expect(r.total).toBeCloseTo(distance(target, comp), 12);
  });

  it('works the two-dimension example by hand: identity encoder, (0, 0) vs (3, 4) => (2, 3)', () => {
    // v({1}) = 3, v({2}) = 4, v({1,2}) = 5; phi_1 = (3 + (5 - 4)) / 2 = 2, phi_2 = (4 + (5 - 3)) / 2 = 3.
    const r = attributeDistance((x) => x, Float64Array.of(0, 0), Float64Array.of(3, 4));
    expect(Array.from(r.values)).toEqual([2, 3]);
  });

  it('sampling (forced by exactUpTo 0) agrees with the exact values within 4 standard errors and still sums exactly', () => {
    const exact = attributeDistance(encode, target, comp);
    const sampled = attributeDistance(encode, target, comp, { exactUpTo: 0, samples: 4000, seed: 5 });
    expect(sampled.method).toBe('sampled');
    for (let j = 0; j < 8; j++) {
      expect(Math.abs((sampled.values[j] ?? 0) - (exact.values[j] ?? 0))).toBeLessThanOrEqual(4 * (sampled.standardError[j] ?? 0) + 1e-12);
    }
    expect(sampled.values[2]).toBe(0);
    expect(sampled.values.reduce((s, v) => s + v, 0)).toBeCloseTo(exact.total, 10);
  });

  it('gives 0 to dimensions missing on either side and sums to v(all) with them taken from the target', () => {
    const t = target.slice();
    const c = comp.slice();
    t[0] = NaN;
    c[5] = NaN;
    const r = attributeDistance(encode, t, c);
    expect(r.values[0]).toBe(0);
    expect(r.values[5]).toBe(0);
    const filled = c.slice();
    filled[0] = NaN; // target lacks it: both sides feed the target's (missing) value
    filled[5] = t[5] ?? NaN;
    expect(r.values.reduce((s, v) => s + v, 0)).toBeCloseTo(distance(t, filled), 12);
  });
});
