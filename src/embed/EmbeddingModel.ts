import { StoreError } from '../errors/KindredError.ts';
import { Autoencoder, AUTOENCODER_FORMAT } from './Autoencoder.ts';
import { PcaEmbedding, PCA_FORMAT } from './PcaEmbedding.ts';

/** The learned spaces a store can hold. */
export type EmbeddingSpace = 'pca' | 'autoencoder';

export const EMBEDDING_SPACES: readonly EmbeddingSpace[] = ['pca', 'autoencoder'];

/** A fitted embedding of either kind: both map a profile (length d, NaN = missing, fed as 0) to a code. */
export type EmbeddingModel =
  | { readonly space: 'pca'; readonly model: PcaEmbedding }
  | { readonly space: 'autoencoder'; readonly model: Autoencoder };

/** Input width d of the model. */
export function modelInputSize(m: EmbeddingModel): number {
  return m.model.d;
}

/** Code size (PCA components or latent units). */
export function modelCodeSize(m: EmbeddingModel): number {
  return m.space === 'pca' ? m.model.k : m.model.latent;
}

/**
 * Rebuilds a saved model, dispatching on its format tag (`kindred-pca-embedding` or
 * `kindred-autoencoder`); each class checks the rest. Anything else is StoreError `kindred.store.corrupt`.
 *
 * @example
 * embeddingModelFromJSON(fitPcaEmbedding(data, 2).toJSON()).space; // => 'pca'
 */
export function embeddingModelFromJSON(json: unknown): EmbeddingModel {
  const format = typeof json === 'object' && json !== null && 'format' in json ? json.format : undefined;
  if (format === PCA_FORMAT) return { space: 'pca', model: PcaEmbedding.fromJSON(json) };
  if (format === AUTOENCODER_FORMAT) return { space: 'autoencoder', model: Autoencoder.fromJSON(json) };
  throw new StoreError(
    'kindred.store.corrupt',
    `embedding model JSON: format ${JSON.stringify(format)} (expected ${PCA_FORMAT} or ${AUTOENCODER_FORMAT})`,
  );
}
