import type { Autoencoder } from './Autoencoder.ts';
import type { EmbedData } from './EmbedData.ts';
import { createWorkspace, forwardBatch, loadRows, reconstructionError } from './lossAndGradient.ts';

/**
 * Masked reconstruction mean squared error of `rows` (all rows when omitted): the sum of squared
 * errors against each row's target (`data.y`, else the row itself) over the entries present in both,
 * divided by their count, no dropout, no penalty. 0 when nothing is present.
 *
 * @example
 * evaluateReconstruction(model, data); // => e.g. 0.21 (z-score units squared)
 */
export function evaluateReconstruction(model: Autoencoder, data: EmbedData, rows?: Int32Array, chunk = 1024): number {
  const indices = rows ?? Int32Array.from({ length: data.n }, (_, i) => i);
  const ws = createWorkspace(model, Math.max(1, Math.min(chunk, indices.length)));
  let sse = 0;
  let present = 0;
  for (let from = 0; from < indices.length; from += ws.capacity) {
    const to = Math.min(indices.length, from + ws.capacity);
    loadRows(ws, data.x, data.d, indices, from, to, data.y);
    forwardBatch(model, ws, null);
    const e = reconstructionError(model, ws);
    sse += e.sse;
    present += e.present;
  }
  return present > 0 ? sse / present : 0;
}
