import type { EmbedData } from './EmbedData.ts';
import type { PcaEmbedding } from './PcaEmbedding.ts';

/**
 * Masked reconstruction MSE of `rows` for every number of leading components 1..k of a PCA embedding:
 * entry q - 1 is the error with q components, over the present entries (the autoencoder's measure, see
 * lossAndGradient), missing inputs fed as 0. Reconstructions are built up one component at a time,
 * x_hat_q = x_hat_(q-1) + c_q v_q, so the whole table costs O(rows * k * d). Empty rows give NaN.
 *
 * @example
 * // one row [1, 0], the single component (1, 0), mean 0: one component reconstructs it exactly
 * pcaLossByComponents(new PcaEmbedding(2, 1, Float64Array.of(0, 0), Float64Array.of(1, 0), Float64Array.of(1, 0)),
 *   { x: Float64Array.of(1, 0), n: 1, d: 2, groups: ['a'] }, Int32Array.of(0)); // => [0]
 */
export function pcaLossByComponents(pca: PcaEmbedding, data: EmbedData, rows: Int32Array): Float64Array {
  const { d, k, mean, components } = pca;
  const sse = new Float64Array(k);
  let present = 0;
  const centred = new Float64Array(d);
  const back = new Float64Array(d);
  for (const i of rows) {
    for (let j = 0; j < d; j++) {
      const v = data.x[i * d + j] ?? NaN;
      centred[j] = (Number.isNaN(v) ? 0 : v) - (mean[j] ?? 0);
      back[j] = mean[j] ?? 0;
      if (!Number.isNaN(v)) present++;
    }
    for (let q = 0; q < k; q++) {
      let c = 0;
      for (let j = 0; j < d; j++) c += (centred[j] ?? 0) * (components[q * d + j] ?? 0);
      let s = 0;
      for (let j = 0; j < d; j++) {
        back[j] = (back[j] ?? 0) + c * (components[q * d + j] ?? 0);
        const v = data.x[i * d + j] ?? NaN;
        if (Number.isNaN(v)) continue;
        const e = (back[j] ?? 0) - v;
        s += e * e;
      }
      sse[q] = (sse[q] ?? 0) + s;
    }
  }
  return Float64Array.from(sse, (s) => (present > 0 ? s / present : NaN));
}
