import { CholeskyDecomposition, inverse, Matrix } from 'ml-matrix';
import type { Autoencoder } from './Autoencoder.ts';

/**
 * The same network with its code re-expressed so that the Euclidean distance between two codes equals
 * the distance their decoder's first layer puts between them: with W (latent x out) that layer's
 * weights and W W' = L L' (Cholesky, L lower triangular), the code becomes c L and the layer's weights
 * L^-1 W, so decode(encode(x)) is unchanged while ||c1 L - c2 L|| = ||(c1 - c2) W||. With no hidden
 * layer that is the distance between the two decoded profiles (for the cross-season objective: between
 * the two predicted other seasons); a code's own scale and rotation, which training leaves arbitrary,
 * no longer weigh in the comps. Returns a new model; the input is returned unchanged when W W' is not
 * positive definite (a code unit the decoder ignores).
 *
 * @example
 * const iso = isometricCode(model);
 * iso.reconstruct(x); // the same as model.reconstruct(x), up to rounding
 */
export function isometricCode(model: Autoencoder): Autoencoder {
  const latentLayer = model.latentLayer;
  const enc = model.layers[latentLayer];
  const dec = model.layers[latentLayer + 1];
  if (!enc || !dec) return model;
  const k = model.latent;
  const out = dec.outSize;
  const w = new Matrix(k, out);
  for (let a = 0; a < k; a++) for (let j = 0; j < out; j++) w.set(a, j, dec.weights[a * out + j] ?? 0);
  const cholesky = new CholeskyDecomposition(w.mmul(w.transpose()));
  if (!cholesky.isPositiveDefinite()) return model;
  const l = cholesky.lowerTriangularMatrix;
  const lInverse = inverse(l);
  const result = model.clone();
  const encOut = result.layers[latentLayer];
  const decOut = result.layers[latentLayer + 1];
  if (!encOut || !decOut) return model;
  // encoder: W_e (in x k) -> W_e L, b_e -> b_e L
  const inSize = enc.inSize;
  for (let i = 0; i < inSize; i++) {
    for (let b = 0; b < k; b++) {
      let s = 0;
      for (let a = 0; a < k; a++) s += (enc.weights[i * k + a] ?? 0) * l.get(a, b);
      encOut.weights[i * k + b] = s;
    }
  }
  for (let b = 0; b < k; b++) {
    let s = 0;
    for (let a = 0; a < k; a++) s += (enc.bias[a] ?? 0) * l.get(a, b);
    encOut.bias[b] = s;
  }
  // decoder's first layer: W -> L^-1 W
  const moved = lInverse.mmul(w);
  for (let a = 0; a < k; a++) for (let j = 0; j < out; j++) decOut.weights[a * out + j] = moved.get(a, j);
  return result;
}
