import { z } from 'zod';
import { StoreError, UsageError } from '../errors/KindredError.ts';
import type { EmbedData } from './EmbedData.ts';

export const PCA_FORMAT = 'kindred-pca-embedding';
export const PCA_VERSION = 1;

export interface PcaEmbeddingJson {
  readonly format: typeof PCA_FORMAT;
  readonly version: typeof PCA_VERSION;
  readonly d: number;
  readonly k: number;
  readonly mean: number[];
  /** k x d, row-major: component c is components[c * d .. c * d + d). */
  readonly components: number[];
  /** Share of variance of every component found (length d, decreasing). */
  readonly explainedVariance: number[];
}

const jsonSchema = z.object({
  format: z.literal(PCA_FORMAT),
  version: z.number(),
  d: z.number().int().positive(),
  k: z.number().int().positive(),
  mean: z.array(z.number()),
  components: z.array(z.number()),
  explainedVariance: z.array(z.number()),
});

/**
 * A PCA embedding: code = (x - mean) . V_k, V_k the k leading principal axes (orthonormal columns);
 * decode = code . V_k^T + mean. Missing inputs (NaN) are fed as 0, as at fitting time.
 * Built by `fitPcaEmbedding` or `fromJSON`.
 *
 * @example
 * const pca = fitPcaEmbedding(data, 2);
 * pca.encode(Float64Array.from([1, 0, NaN, 2])); // 2 numbers
 */
export class PcaEmbedding {
  readonly d: number;
  readonly k: number;
  readonly mean: Float64Array;
  readonly components: Float64Array;
  readonly explainedVariance: Float64Array;

  constructor(d: number, k: number, mean: Float64Array, components: Float64Array, explainedVariance: Float64Array) {
    if (!(Number.isInteger(d) && d > 0 && Number.isInteger(k) && k > 0 && k <= d)) {
      throw new UsageError(`PCA embedding: k ${k}, d ${d} (expected integers 1 <= k <= d)`);
    }
    if (mean.length !== d || components.length !== k * d) {
      throw new UsageError(`PCA embedding: mean ${mean.length}, components ${components.length} (expected ${d} and ${k * d})`);
    }
    this.d = d;
    this.k = k;
    this.mean = mean;
    this.components = components;
    this.explainedVariance = explainedVariance;
  }

  encode(x: Float64Array): Float64Array {
    if (x.length !== this.d) throw new UsageError(`PCA embedding.encode: vector of length ${x.length} (expected ${this.d})`);
    const code = new Float64Array(this.k);
    for (let j = 0; j < this.d; j++) {
      const v = x[j] ?? NaN;
      const c = (Number.isNaN(v) ? 0 : v) - (this.mean[j] ?? 0);
      for (let q = 0; q < this.k; q++) code[q] = (code[q] ?? 0) + c * (this.components[q * this.d + j] ?? 0);
    }
    return code;
  }

  decode(code: Float64Array): Float64Array {
    if (code.length !== this.k) throw new UsageError(`PCA embedding.decode: code of length ${code.length} (expected ${this.k})`);
    const x = this.mean.slice();
    for (let q = 0; q < this.k; q++) {
      const c = code[q] ?? 0;
      for (let j = 0; j < this.d; j++) x[j] = (x[j] ?? 0) + c * (this.components[q * this.d + j] ?? 0);
    }
    return x;
  }

  /** Masked reconstruction MSE over the present entries of `data` (the autoencoder's measure). */
  reconstructionError(data: EmbedData): number {
    let sse = 0;
    let present = 0;
    for (let i = 0; i < data.n; i++) {
      const row = data.x.subarray(i * data.d, (i + 1) * data.d);
      const back = this.decode(this.encode(row));
      for (let j = 0; j < data.d; j++) {
        const v = row[j] ?? NaN;
        if (Number.isNaN(v)) continue;
        const e = (back[j] ?? 0) - v;
        sse += e * e;
        present++;
      }
    }
    return present > 0 ? sse / present : 0;
  }

  toJSON(): PcaEmbeddingJson {
    return {
      format: PCA_FORMAT,
      version: PCA_VERSION,
      d: this.d,
      k: this.k,
      mean: Array.from(this.mean),
      components: Array.from(this.components),
      explainedVariance: Array.from(this.explainedVariance),
    };
  }

  /** Refuses a wrong tag or shape with StoreError `kindred.store.corrupt`, another version with `kindred.store.version`. */
  static fromJSON(json: unknown): PcaEmbedding {
    const parsed = jsonSchema.safeParse(json);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const where = issue ? issue.path.join('.') || '(root)' : '(root)';
      throw new StoreError('kindred.store.corrupt', `PCA embedding JSON: ${where}: ${issue?.message ?? 'invalid'} (expected a ${PCA_FORMAT})`, { path: where });
    }
    const j = parsed.data;
    if (j.version !== PCA_VERSION) {
      throw new StoreError('kindred.store.version', `PCA embedding JSON: version ${j.version} (expected ${PCA_VERSION})`, { version: j.version });
    }
    if (j.k > j.d || j.mean.length !== j.d || j.components.length !== j.k * j.d || j.explainedVariance.length > j.d) {
      throw new StoreError(
        'kindred.store.corrupt',
        `PCA embedding JSON: k ${j.k}, d ${j.d}, mean ${j.mean.length}, components ${j.components.length}, explainedVariance ${j.explainedVariance.length} (expected k <= d, mean d, components k * d, at most d shares)`,
      );
    }
    return new PcaEmbedding(j.d, j.k, Float64Array.from(j.mean), Float64Array.from(j.components), Float64Array.from(j.explainedVariance));
  }
}
