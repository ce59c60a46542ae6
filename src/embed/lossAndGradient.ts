import { activateInPlace, multiplyByDerivative } from './activation.ts';
import type { Autoencoder } from './Autoencoder.ts';
import type { Rng } from '../random/Rng.ts';

/**
 * The training objective of the autoencoder and its gradient by back-propagation
 * (Rumelhart, Hinton and Williams 1986), on a batch of rows held in a reusable workspace.
 *
 * loss = (1 / M) * sum over PRESENT entries (output - y)^2              (masked mean squared error)
 *      + (l2 / 2) * sum of squared weights + l1 * sum of |weights|       (biases are not penalised)
 * where y is the row's target: the input x itself (a plain autoencoder) or, for the cross-season
 * objective, another season of the same player; an entry is PRESENT when both x and y have it, and M
 * counts the present entries in the batch. A missing input is fed as 0 and its entry is left out of the
 * error, so the network is never trained toward a made-up value. With M = 0 the error term is 0. Dropout (Srivastava et al. 2014, who scale at test time) in its inverted
 * form (common practice): a hidden unit is kept with probability 1 - rate and scaled by 1 / (1 - rate)
 * during training, untouched at inference.
 *
 * @example
 * // one row [1, NaN]: only the first entry counts, M = 1
 * const ws = createWorkspace(model, 1); loadRows(ws, Float64Array.from([1, NaN]), 2, Int32Array.of(0), 0, 1);
 * lossAndGradient(model, ws, { l2: 0, l1: 0 }, null, createGradients(model)).present; // => 1
 */
export interface Workspace {
  readonly capacity: number;
  readonly d: number;
  /** capacity * d, missing fed as 0. */
  readonly input: Float64Array;
  /** capacity * d, the target (the input itself for a plain autoencoder), missing as 0. */
  readonly target: Float64Array;
  /** capacity * d, 1 where the entry is present in both the input and the target. */
  readonly present: Uint8Array;
  /** Per layer, capacity * outSize: the output passed on (after dropout). */
  readonly outputs: Float64Array[];
  /** Per layer: the activation before dropout (the same array as `outputs` for layers without dropout). */
  readonly activated: Float64Array[];
  /** Per layer: dropout multipliers (0 or 1 / (1 - rate)); empty for layers without dropout. */
  readonly dropMask: Float64Array[];
  /** Per layer: gradient of the loss with respect to the layer's pre-activation. */
  readonly deltas: Float64Array[];
  /** Rows loaded. */
  rows: number;
}

export interface Gradients {
  readonly weights: Float64Array[];
  readonly bias: Float64Array[];
}

export interface Regularisation {
  readonly l2: number;
  readonly l1: number;
}

export interface DropoutSetting {
  readonly rate: number;
  readonly rng: Rng;
}

export interface BatchLoss {
  /** Full objective: masked MSE plus penalties. */
  readonly loss: number;
  /** Sum of squared errors over present entries. */
  readonly sse: number;
  /** Present entries in the batch. */
  readonly present: number;
}

export function createWorkspace(model: Autoencoder, capacity: number): Workspace {
  const outputs: Float64Array[] = [];
  const activated: Float64Array[] = [];
  const dropMask: Float64Array[] = [];
  const deltas: Float64Array[] = [];
  for (const layer of model.layers) {
    const out = new Float64Array(capacity * layer.outSize);
    outputs.push(out);
    activated.push(layer.hiddenLayer ? new Float64Array(capacity * layer.outSize) : out);
    dropMask.push(layer.hiddenLayer ? new Float64Array(capacity * layer.outSize) : new Float64Array(0));
    deltas.push(new Float64Array(capacity * layer.outSize));
  }
  return {
    capacity,
    d: model.d,
    input: new Float64Array(capacity * model.d),
    target: new Float64Array(capacity * model.d),
    present: new Uint8Array(capacity * model.d),
    outputs,
    activated,
    dropMask,
    deltas,
    rows: 0,
  };
}

export function createGradients(model: Autoencoder): Gradients {
  return {
    weights: model.layers.map((l) => new Float64Array(l.weights.length)),
    bias: model.layers.map((l) => new Float64Array(l.bias.length)),
  };
}

/**
 * Copies rows `indices[from, to)` of `x` (n * d, NaN = missing) into the workspace, with their targets
 * from `y` (same layout) or, when `y` is omitted, the rows themselves.
 */
export function loadRows(ws: Workspace, x: Float64Array, d: number, indices: Int32Array, from: number, to: number, y?: Float64Array): void {
  const rows = to - from;
  const targets = y ?? x;
  for (let r = 0; r < rows; r++) {
    const src = (indices[from + r] ?? 0) * d;
    const dst = r * d;
    for (let j = 0; j < d; j++) {
      const v = x[src + j] ?? NaN;
      const t = targets[src + j] ?? NaN;
      const missing = Number.isNaN(v);
      ws.input[dst + j] = missing ? 0 : v;
      ws.target[dst + j] = Number.isNaN(t) ? 0 : t;
      ws.present[dst + j] = missing || Number.isNaN(t) ? 0 : 1;
    }
  }
  ws.rows = rows;
}

/** Forward pass over the loaded rows (i-k-j loops); dropout on hidden layers when `dropout` is given. */
export function forwardBatch(model: Autoencoder, ws: Workspace, dropout: DropoutSetting | null): void {
  const rows = ws.rows;
  let a = ws.input;
  model.layers.forEach((layer, l) => {
    const { inSize, outSize, weights, bias } = layer;
    const act = ws.activated[l] ?? new Float64Array(0);
    for (let i = 0; i < rows; i++) {
      const ai = i * inSize;
      const zi = i * outSize;
      for (let j = 0; j < outSize; j++) act[zi + j] = bias[j] ?? 0;
      for (let k = 0; k < inSize; k++) {
        const v = a[ai + k] ?? 0;
        if (v === 0) continue;
        const wk = k * outSize;
        for (let j = 0; j < outSize; j++) act[zi + j] = (act[zi + j] ?? 0) + v * (weights[wk + j] ?? 0);
      }
    }
    activateInPlace(layer.activation, act, 0, rows * outSize);
    const out = ws.outputs[l] ?? act;
    if (layer.hiddenLayer) {
      const mask = ws.dropMask[l] ?? new Float64Array(0);
      const count = rows * outSize;
      if (dropout && dropout.rate > 0) {
        const keep = 1 - dropout.rate;
        const scale = 1 / keep;
        for (let i = 0; i < count; i++) {
          const m = dropout.rng.next() < keep ? scale : 0;
          mask[i] = m;
          out[i] = (act[i] ?? 0) * m;
        }
      } else {
        mask.fill(1, 0, count);
        out.set(act.subarray(0, count));
      }
    }
    a = out;
  });
}

/** Sum of squared errors (output - target) over present entries of the last forward pass, and their count. */
export function reconstructionError(model: Autoencoder, ws: Workspace): { sse: number; present: number } {
  const out = ws.outputs[model.layers.length - 1] ?? new Float64Array(0);
  const count = ws.rows * ws.d;
  let sse = 0;
  let present = 0;
  for (let i = 0; i < count; i++) {
    if (ws.present[i] === 0) continue;
    const e = (out[i] ?? 0) - (ws.target[i] ?? 0);
    sse += e * e;
    present++;
  }
  return { sse, present };
}

/** Forward pass, loss and its gradient (written into `grads`, overwritten) for the loaded rows. */
export function lossAndGradient(
  model: Autoencoder,
  ws: Workspace,
  reg: Regularisation,
  dropout: DropoutSetting | null,
  grads: Gradients,
): BatchLoss {
  forwardBatch(model, ws, dropout);
  const { sse, present } = reconstructionError(model, ws);
  const rows = ws.rows;
  const last = model.layers.length - 1;

  // d loss / d output for the (linear) output layer: 2 (output - y) / M on present entries, 0 elsewhere.
  const out = ws.outputs[last] ?? new Float64Array(0);
  const top = ws.deltas[last] ?? new Float64Array(0);
  const scale = present > 0 ? 2 / present : 0;
  for (let i = 0; i < rows * ws.d; i++) {
    top[i] = ws.present[i] === 0 ? 0 : scale * ((out[i] ?? 0) - (ws.target[i] ?? 0));
  }

  for (let l = last; l >= 0; l--) {
    const layer = model.layers[l];
    if (!layer) continue;
    const { inSize, outSize, weights } = layer;
    const dz = ws.deltas[l] ?? new Float64Array(0);
    const a = l === 0 ? ws.input : (ws.outputs[l - 1] ?? ws.input);
    const gw = grads.weights[l] ?? new Float64Array(0);
    const gb = grads.bias[l] ?? new Float64Array(0);
    gw.fill(0);
    gb.fill(0);
    for (let i = 0; i < rows; i++) {
      const ai = i * inSize;
      const zi = i * outSize;
      for (let j = 0; j < outSize; j++) gb[j] = (gb[j] ?? 0) + (dz[zi + j] ?? 0);
      for (let k = 0; k < inSize; k++) {
        const v = a[ai + k] ?? 0;
        if (v === 0) continue;
        const wk = k * outSize;
        for (let j = 0; j < outSize; j++) gw[wk + j] = (gw[wk + j] ?? 0) + v * (dz[zi + j] ?? 0);
      }
    }
    if (l > 0) {
      const below = model.layers[l - 1];
      const da = ws.deltas[l - 1] ?? new Float64Array(0);
      for (let i = 0; i < rows; i++) {
        const ai = i * inSize;
        const zi = i * outSize;
        for (let k = 0; k < inSize; k++) {
          const wk = k * outSize;
          let s = 0;
          for (let j = 0; j < outSize; j++) s += (dz[zi + j] ?? 0) * (weights[wk + j] ?? 0);
          da[ai + k] = s;
        }
      }
      if (below) {
        const count = rows * inSize;
        if (below.hiddenLayer) {
          const mask = ws.dropMask[l - 1] ?? new Float64Array(0);
          for (let i = 0; i < count; i++) da[i] = (da[i] ?? 0) * (mask[i] ?? 0);
        }
        multiplyByDerivative(below.activation, da, ws.activated[l - 1] ?? da, count);
      }
    }
  }

  let penalty = 0;
  model.layers.forEach((layer, l) => {
    const gw = grads.weights[l] ?? new Float64Array(0);
    const w = layer.weights;
    for (let i = 0; i < w.length; i++) {
      const wi = w[i] ?? 0;
      penalty += 0.5 * reg.l2 * wi * wi + reg.l1 * Math.abs(wi);
      gw[i] = (gw[i] ?? 0) + reg.l2 * wi + reg.l1 * Math.sign(wi);
    }
  });
  return { loss: (present > 0 ? sse / present : 0) + penalty, sse, present };
}
