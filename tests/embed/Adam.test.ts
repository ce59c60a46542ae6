/**
 * Adam against Kingma and Ba 2015 ("Adam: A Method for Stochastic Optimization", ICLR), Algorithm 1,
 * worked by hand for one parameter over two steps (lr 0.1, beta1 0.9, beta2 0.999, eps 1e-8):
 *   t = 1, g = 0.5:  m = 0.05,   v = 0.00025,    m^ = 0.5,           v^ = 0.25,        p = 0.3 - 0.1 * 0.5 / (0.5 + 1e-8) = 0.200000002
 *   t = 2, g = -1:   m = -0.055, v = 0.00124975, m^ = -0.055 / 0.19, v^ = 0.00124975 / 0.001999,
 *                    p = 0.200000002 + 0.1 * 0.289473684 / (0.790688... + 1e-8) = 0.236610354
 */
import { describe, expect, it } from 'vitest';
import { Adam } from '../../src/embed/Adam.ts';
import { Autoencoder } from '../../src/embed/Autoencoder.ts';
import { createGradients } from '../../src/embed/lossAndGradient.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';

const SETTINGS = { learningRate: 0.1, beta1: 0.9, beta2: 0.999, epsilon: 1e-8 };

function model(): Autoencoder {
  return Autoencoder.initialise({ d: 2, hidden: [], latent: 1, activation: 'tanh' }, new SeededRandom(3));
}

describe('Adam(model, settings).step(model, gradients)', () => {
  it('follows the worked two-step example of Algorithm 1 for one weight and leaves a weight with zero gradient alone', () => {
    const net = model();
    const first = net.layers[0];
    if (!first) throw new Error('no first layer');
    first.weights[0] = 0.3;
    const untouched = first.weights[1] ?? NaN;
    const adam = new Adam(net, SETTINGS);
    const grads = createGradients(net);
    const g = grads.weights[0];
    if (!g) throw new Error('no gradient array');
    g[0] = 0.5;
    adam.step(net, grads);
    expect(first.weights[0]).toBeCloseTo(0.200000002, 9);
    g[0] = -1;
    adam.step(net, grads);
    expect(first.weights[0]).toBeCloseTo(0.2366103542, 9);
    expect(first.weights[1]).toBe(untouched);
  });

  it('moves every parameter by about the learning rate on the first step, whatever the gradient size (bias correction)', () => {
    // Kingma and Ba 2015, section 2.1: the effective first step is bounded by lr, |m^ / sqrt(v^)| = 1 at t = 1
    const net = model();
    const before = net.layers.map((l) => Float64Array.from(l.weights));
    const grads = createGradients(net);
    grads.weights.forEach((w, l) => w.forEach((_, i) => (w[i] = (i % 2 === 0 ? 1 : -1) * 10 ** (l - i))));
    new Adam(net, SETTINGS).step(net, grads);
    net.layers.forEach((layer, l) =>
      layer.weights.forEach((w, i) => {
        const sign = Math.sign(grads.weights[l]?.[i] ?? 0);
        expect(w - (before[l]?.[i] ?? NaN)).toBeCloseTo(-sign * SETTINGS.learningRate, 6);
      }),
    );
  });
});
