import type { Encoder } from '../embed/embeddedDistanceGame.ts';
import type { EmbeddingSpace } from '../embed/EmbeddingModel.ts';
import type { GroupEmbeddingFile } from './groupEmbeddingFile.ts';

/** A group's learned space as queries see it (loaded and checked by loadGroupEmbedding). */
export interface StoredEmbedding {
  readonly space: EmbeddingSpace;
  /** Input dimensions. */
  readonly d: number;
  /** Code size. */
  readonly dim: number;
  /** The model's encoder: standardised profile (length d, NaN = missing, fed as 0) to code (length dim). */
  readonly encode: Encoder;
  /** Every row's code, n x dim, as written at build time. */
  readonly codes: Float64Array;
  /** Likeness scale s (see src/embed/pairScale.ts and embeddedLikeness). */
  readonly pairScale: number;
  /** Per input dimension: mean |attribution| over the build's sample of comps (0 when never in play). */
  readonly drivers: Float64Array;
  /** The summary file (search table, histories, drivers, chart names). */
  readonly summary: GroupEmbeddingFile;
}
