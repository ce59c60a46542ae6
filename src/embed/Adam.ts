import type { Autoencoder } from './Autoencoder.ts';
import type { Gradients } from './lossAndGradient.ts';

export interface AdamSettings {
  readonly learningRate: number;
  /** Default 0.9 (Kingma and Ba 2015, Algorithm 1). */
  readonly beta1: number;
  /** Default 0.999 (same source). */
  readonly beta2: number;
  /** Default 1e-8 (same source). */
  readonly epsilon: number;
}

/**
 * Adam (Kingma and Ba 2015, "Adam: A Method for Stochastic Optimization", ICLR; Algorithm 1):
 * m = b1 m + (1 - b1) g; v = b2 v + (1 - b2) g^2; p -= lr * (m / (1 - b1^t)) / (sqrt(v / (1 - b2^t)) + eps).
 *
 * @example
 * // first step moves each parameter by about lr against the sign of its gradient
 * new Adam(model, { learningRate: 0.01, beta1: 0.9, beta2: 0.999, epsilon: 1e-8 }).step(model, grads);
 */
export class Adam {
  private readonly settings: AdamSettings;
  private readonly m: Float64Array[];
  private readonly v: Float64Array[];
  private t = 0;

  constructor(model: Autoencoder, settings: AdamSettings) {
    this.settings = settings;
    this.m = [];
    this.v = [];
    for (const layer of model.layers) {
      this.m.push(new Float64Array(layer.weights.length), new Float64Array(layer.bias.length));
      this.v.push(new Float64Array(layer.weights.length), new Float64Array(layer.bias.length));
    }
  }

  step(model: Autoencoder, grads: Gradients): void {
    this.t++;
    const { learningRate, beta1, beta2, epsilon } = this.settings;
    const c1 = 1 - Math.pow(beta1, this.t);
    const c2 = 1 - Math.pow(beta2, this.t);
    model.layers.forEach((layer, l) => {
      this.update(layer.weights, grads.weights[l], this.m[2 * l], this.v[2 * l], learningRate, beta1, beta2, epsilon, c1, c2);
      this.update(layer.bias, grads.bias[l], this.m[2 * l + 1], this.v[2 * l + 1], learningRate, beta1, beta2, epsilon, c1, c2);
    });
  }

  private update(
    p: Float64Array,
    g: Float64Array | undefined,
    m: Float64Array | undefined,
    v: Float64Array | undefined,
    lr: number,
    b1: number,
    b2: number,
    eps: number,
    c1: number,
    c2: number,
  ): void {
    if (!g || !m || !v) return;
    for (let i = 0; i < p.length; i++) {
      const gi = g[i] ?? 0;
      const mi = b1 * (m[i] ?? 0) + (1 - b1) * gi;
      const vi = b2 * (v[i] ?? 0) + (1 - b2) * gi * gi;
      m[i] = mi;
      v[i] = vi;
      p[i] = (p[i] ?? 0) - (lr * (mi / c1)) / (Math.sqrt(vi / c2) + eps);
    }
  }
}
