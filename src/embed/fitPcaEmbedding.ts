import { PCA } from 'ml-pca';
import { UsageError } from '../errors/KindredError.ts';
import { checkEmbedData, type EmbedData } from './EmbedData.ts';
import { PcaEmbedding } from './PcaEmbedding.ts';

/**
 * Fits a k-component PCA embedding (Pearson 1901; Hotelling 1933) with ml-pca (centred, not scaled:
 * the dimensions are already z-scores), missing entries imputed as 0 (the stratum mean).
 * Signs are fixed so each component's largest-magnitude loading is positive (common practice),
 * making the result independent of the decomposition's arbitrary signs. Cost O(n d^2) (SVD).
 *
 * @example
 * fitPcaEmbedding(data, 2).explainedVariance; // shares of variance, decreasing, summing to 1
 */
export function fitPcaEmbedding(data: EmbedData, k: number): PcaEmbedding {
  checkEmbedData(data);
  const { n, d, x } = data;
  if (!(Number.isInteger(k) && k >= 1 && k <= d)) throw new UsageError(`fitPcaEmbedding: k ${k} (expected an integer from 1 to d = ${d})`);
  if (n < 2) throw new UsageError(`fitPcaEmbedding: ${n} row (expected at least 2)`);
  const rows: number[][] = [];
  for (let i = 0; i < n; i++) {
    const row: number[] = [];
    for (let j = 0; j < d; j++) {
      const v = x[i * d + j] ?? NaN;
      row.push(Number.isNaN(v) ? 0 : v);
    }
    rows.push(row);
  }
  const pca = new PCA(rows, { center: true, scale: false });
  const vectors = pca.getEigenvectors(); // d x d, columns are the axes
  const mean = Float64Array.from(pca.toJSON().means);
  const components = new Float64Array(k * d);
  for (let q = 0; q < k; q++) {
    let pivot = 0;
    for (let j = 0; j < d; j++) if (Math.abs(vectors.get(j, q)) > Math.abs(vectors.get(pivot, q))) pivot = j;
    const sign = vectors.get(pivot, q) < 0 ? -1 : 1;
    for (let j = 0; j < d; j++) components[q * d + j] = sign * vectors.get(j, q);
  }
  return new PcaEmbedding(d, k, mean, components, Float64Array.from(pca.getExplainedVariance()));
}
