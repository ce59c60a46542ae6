/** Activation of the hidden layers. `identity` makes the network linear (used to check it against PCA). */
export type Activation = 'tanh' | 'relu' | 'identity';

export const ACTIVATIONS: readonly Activation[] = ['tanh', 'relu', 'identity'];

/**
 * Applies an activation in place to `z[from, to)`.
 *
 * @example
 * activateInPlace('relu', Float64Array.from([-1, 2]), 0, 2); // => [0, 2]
 */
export function activateInPlace(kind: Activation, z: Float64Array, from: number, to: number): void {
  if (kind === 'tanh') for (let i = from; i < to; i++) z[i] = Math.tanh(z[i] ?? 0);
  else if (kind === 'relu') for (let i = from; i < to; i++) z[i] = Math.max(0, z[i] ?? 0);
}

/**
 * Multiplies a gradient in place by the activation's derivative, written in terms of the
 * activation's output `a`: tanh' = 1 - a^2, relu' = [a > 0], identity' = 1.
 *
 * @example
 * // tanh output 0.5: derivative 0.75
 * const g = Float64Array.from([2]); multiplyByDerivative('tanh', g, Float64Array.from([0.5]), 1); // g => [1.5]
 */
export function multiplyByDerivative(kind: Activation, grad: Float64Array, a: Float64Array, count: number): void {
  if (kind === 'tanh') {
    for (let i = 0; i < count; i++) {
      const ai = a[i] ?? 0;
      grad[i] = (grad[i] ?? 0) * (1 - ai * ai);
    }
  } else if (kind === 'relu') {
    for (let i = 0; i < count; i++) if (!((a[i] ?? 0) > 0)) grad[i] = 0;
  }
}
