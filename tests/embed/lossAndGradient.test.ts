import { describe, expect, it } from 'vitest';
import { Autoencoder } from '../../src/embed/Autoencoder.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';
import { createGradients, createWorkspace, loadRows, lossAndGradient } from '../../src/embed/lossAndGradient.ts';
import type { Activation } from '../../src/embed/activation.ts';

// Rows with missing entries (NaN): 5 rows x 4 dimensions, invented for the check.
const x = Float64Array.from([
  0.3, -1.2, NaN, 0.8,
  1.1, 0.4, -0.7, NaN,
  NaN, NaN, 0.2, -0.5,
  -0.9, 1.6, 0.1, 0.0,
  0.5, NaN, -1.4, 2.1,
]);
const rows = Int32Array.from([0, 1, 2, 3, 4]);
// The cross-season targets of those rows (another season of the same invented player), with their own gaps.
const y = Float64Array.from([
  0.1, -0.8, 0.4, NaN,
  0.9, NaN, -0.2, 0.6,
  -0.3, 0.7, 0.5, -0.1,
  -1.2, 1.1, NaN, 0.3,
  0.2, -0.4, -1.0, 1.5,
]);
const reg = { l2: 0.03, l1: 0.002 };

function setup(activation: Activation, hidden: number[]): Autoencoder {
  const model = Autoencoder.initialise({ d: 4, hidden, latent: 2, activation }, new SeededRandom(9));
  const rng = new SeededRandom(10);
  for (const layer of model.layers) for (let i = 0; i < layer.bias.length; i++) layer.bias[i] = 0.2 * rng.normal();
  return model;
}

function loss(model: Autoencoder, target?: Float64Array): number {
  const ws = createWorkspace(model, 5);
  loadRows(ws, x, 4, rows, 0, 5, target);
  return lossAndGradient(model, ws, reg, null, createGradients(model)).loss;
}

/** Largest relative gap between the back-propagated gradient and central finite differences, every parameter. */
function worstGradientGap(model: Autoencoder, target?: Float64Array): number {
  const ws = createWorkspace(model, 5);
  loadRows(ws, x, 4, rows, 0, 5, target);
  const grads = createGradients(model);
  lossAndGradient(model, ws, reg, null, grads);
  const h = 1e-5;
  let worst = 0;
  model.layers.forEach((layer, l) => {
    for (const [params, analytic] of [[layer.weights, grads.weights[l]], [layer.bias, grads.bias[l]]] as const) {
      for (let i = 0; i < params.length; i++) {
        const saved = params[i] ?? 0;
        params[i] = saved + h;
        const up = loss(model, target);
        params[i] = saved - h;
        const down = loss(model, target);
        params[i] = saved;
        const numeric = (up - down) / (2 * h);
        const a = analytic?.[i] ?? NaN;
        worst = Math.max(worst, Math.abs(a - numeric) / Math.max(Math.abs(a) + Math.abs(numeric), 1e-8));
      }
    }
  });
  return worst;
}

describe('lossAndGradient', () => {
  for (const [activation, hidden] of [['tanh', [3]], ['tanh', [3, 5]], ['relu', [3, 5]], ['identity', [3]]] as const) {
    it(`back-propagated gradients match central finite differences (${activation}, hidden ${hidden.join('-')}, with mask, L2 and L1)`, () => {
      // Source: gradient checking by central differences (f(p + h) - f(p - h)) / 2h, error O(h^2)
      // (common practice; e.g. Goodfellow, Bengio and Courville 2016, Deep Learning, section 11.5).
      const model = setup(activation, [...hidden]);
      const ws = createWorkspace(model, 5);
      loadRows(ws, x, 4, rows, 0, 5);
      const grads = createGradients(model);
      lossAndGradient(model, ws, reg, null, grads);
      const h = 1e-5;
      let worst = 0;
      model.layers.forEach((layer, l) => {
        for (const [params, analytic] of [[layer.weights, grads.weights[l]], [layer.bias, grads.bias[l]]] as const) {
          for (let i = 0; i < params.length; i++) {
            const saved = params[i] ?? 0;
            params[i] = saved + h;
            const up = loss(model);
            params[i] = saved - h;
            const down = loss(model);
            params[i] = saved;
            const numeric = (up - down) / (2 * h);
            const a = analytic?.[i] ?? NaN;
            const rel = Math.abs(a - numeric) / Math.max(Math.abs(a) + Math.abs(numeric), 1e-8);
            worst = Math.max(worst, rel);
          }
        }
      });
      expect(worst).toBeLessThan(1e-5);
    });
  }

  it('the loss is the mean squared error over present entries only, plus (l2/2) sum w^2 + l1 sum |w|', () => {
    // Independent recomputation through Autoencoder.reconstruct (a separate code path), by the definition.
    const model = setup('tanh', [3]);
    let sse = 0;
    let present = 0;
    for (let i = 0; i < 5; i++) {
      const row = x.subarray(i * 4, i * 4 + 4);
      const back = model.reconstruct(row);
      for (let j = 0; j < 4; j++) {
        const v = row[j] ?? NaN;
        if (Number.isNaN(v)) continue;
        sse += ((back[j] ?? 0) - v) ** 2;
        present++;
      }
    }
    let penalty = 0;
    for (const layer of model.layers) for (const w of layer.weights) penalty += 0.5 * reg.l2 * w * w + reg.l1 * Math.abs(w);
    expect(present).toBe(15);
    expect(loss(model)).toBeCloseTo(sse / present + penalty, 12);
  });

  for (const [activation, hidden] of [['tanh', [3]], ['relu', [3, 5]], ['identity', []]] as const) {
    it(`cross-season objective (target = another season): gradients match central finite differences (${activation}, hidden ${hidden.join('-') || 'none'}, gaps in input and target, L2 and L1)`, () => {
      // Source: gradient checking by central differences (f(p + h) - f(p - h)) / 2h, error O(h^2)
      // (common practice; e.g. Goodfellow, Bengio and Courville 2016, Deep Learning, section 11.5).
      expect(worstGradientGap(setup(activation, [...hidden]), y)).toBeLessThan(1e-5);
    });
  }

  it('cross-season objective: the loss is the mean squared error against the target over entries present in BOTH input and target', () => {
    // Independent recomputation through Autoencoder.reconstruct, by the definition: x row 0 lacks
    // dimension 2, its target lacks dimension 3, so row 0 contributes dimensions 0 and 1 only.
    const model = setup('tanh', [3]);
    let sse = 0;
    let present = 0;
    for (let i = 0; i < 5; i++) {
      const back = model.reconstruct(x.subarray(i * 4, i * 4 + 4));
      for (let j = 0; j < 4; j++) {
        const v = x[i * 4 + j] ?? NaN;
        const t = y[i * 4 + j] ?? NaN;
        if (Number.isNaN(v) || Number.isNaN(t)) continue;
        sse += ((back[j] ?? 0) - t) ** 2;
        present++;
      }
    }
    let penalty = 0;
    for (const layer of model.layers) for (const w of layer.weights) penalty += 0.5 * reg.l2 * w * w + reg.l1 * Math.abs(w);
    expect(present).toBe(12);
    expect(loss(model, y)).toBeCloseTo(sse / present + penalty, 12);
    expect(loss(model, y)).not.toBeCloseTo(loss(model), 3);
  });

  it('a missing entry gets no gradient toward any value: the output-layer delta is 0 there', () => {
    const model = setup('tanh', [3]);
    const ws = createWorkspace(model, 5);
    loadRows(ws, x, 4, rows, 0, 5);
    lossAndGradient(model, ws, { l2: 0, l1: 0 }, null, createGradients(model));
    const top = ws.deltas[model.layers.length - 1] ?? new Float64Array(0);
    for (let i = 0; i < 20; i++) {
      if (Number.isNaN(x[i] ?? NaN)) expect(top[i]).toBe(0);
      else expect(top[i]).not.toBe(0);
    }
  });

  it('inverted dropout keeps the expected hidden activation: kept units are scaled by 1 / (1 - rate)', () => {
    // Dropout: Srivastava et al. 2014, "Dropout", JMLR 15, which scales the weights at test time by the
    // keep probability; scaling the kept units by 1 / (1 - rate) at training time instead (inverted
    // dropout, same expected activation) is common practice.
    const model = setup('tanh', [3]);
    const ws = createWorkspace(model, 5);
    loadRows(ws, x, 4, rows, 0, 5);
    lossAndGradient(model, ws, { l2: 0, l1: 0 }, { rate: 0.5, rng: new SeededRandom(1) }, createGradients(model));
    const mask = ws.dropMask[0] ?? new Float64Array(0);
    expect(mask.length).toBe(15);
    for (const m of mask) expect([0, 2]).toContain(m);
    expect(ws.outputs[0]?.[0]).toBeCloseTo((ws.activated[0]?.[0] ?? 0) * (mask[0] ?? 0), 15);
  });
});
