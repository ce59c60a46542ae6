/**
 * The embedding part of a position group in the store: `group-<G>.embedding.json` (this schema: the
 * space, the size search, the learning histories, the likeness scale and the attribution summary),
 * `group-<G>.model.json` (the weights, PcaEmbedding or Autoencoder JSON) and `group-<G>.codes.f64`
 * (every row's code, n x dim float64, little-endian). All three are listed with their checksums in the
 * store manifest, so a changed byte is refused on open.
 */
import { z } from 'zod';

export const GROUP_EMBEDDING_FORMAT = 'kindred-group-embedding';
export const GROUP_EMBEDDING_VERSION = 1;

const searchRowSchema = z.strictObject({
  /** Code size tried (PCA components or latent units). */
  size: z.number().int().positive(),
  /** Encoder hidden widths ([] for PCA). */
  hidden: z.array(z.number().int().positive()),
  /** Epochs run (null for PCA, which is solved, not trained). */
  epochs: z.number().int().nonnegative().nullable(),
  /** Masked reconstruction MSE on the training rows (z units squared; null if training diverged). */
  train_loss: z.number().nullable(),
  /** Masked reconstruction MSE on the held-out players' rows (null when nothing was held out or training diverged). */
  val_loss: z.number().nullable(),
  /** PCA: cumulative share of variance of the first `size` components (null for the autoencoder). */
  explained: z.number().nullable(),
  chosen: z.boolean(),
});

const historySchema = z.strictObject({
  size: z.number().int().positive(),
  hidden: z.array(z.number().int().positive()),
  best_epoch: z.number().int().nonnegative(),
  /** Per epoch (null where the loss was not finite). */
  train: z.array(z.number().nullable()),
  val: z.array(z.number().nullable()),
});

const driverSchema = z.strictObject({
  name: z.string(),
  /** Mean |attribution| over the sampled comps (embedded-distance units). */
  mean_abs: z.number(),
  mean: z.number(),
  min: z.number(),
  q1: z.number(),
  median: z.number(),
  q3: z.number(),
  max: z.number(),
  /** Comps in which the dimension was in play (present on both sides). */
  count: z.number().int().nonnegative(),
});

export const groupEmbeddingSchema = z.strictObject({
  format: z.literal(GROUP_EMBEDDING_FORMAT),
  version: z.number().int(),
  group: z.string(),
  space: z.enum(['pca', 'autoencoder']),
  /** Input dimensions. */
  d: z.number().int().positive(),
  /** Code size. */
  dim: z.number().int().positive(),
  n: z.number().int().nonnegative(),
  /** Multiplier of each input dimension before the model (sqrt of the weights, or all 1 for plain z); see scaledEncoder. */
  input_scale: z.array(z.number().nonnegative()),
  /** Likeness scale s: half the mean squared embedded distance of random pairs (see src/embed/pairScale.ts). */
  pair_scale: z.number().positive(),
  search: z.strictObject({
    /** How the size was chosen, in words. */
    rule: z.string(),
    rows: z.array(searchRowSchema),
    chosen_size: z.number().int().positive(),
    /** Rows the search trained on (a sample of whole players when the group is large). */
    search_rows: z.number().int().nonnegative(),
  }),
  /** Learning history of every size tried ([] for PCA). */
  histories: z.array(historySchema),
  drivers: z.strictObject({
    /** Targets sampled and comps per target. */
    targets: z.number().int().nonnegative(),
    comps: z.number().int().nonnegative(),
    dims: z.array(driverSchema),
  }),
  training: z.strictObject({
    seconds: z.number().nonnegative(),
    rows: z.number().int().nonnegative(),
    settings: z.record(z.string(), z.unknown()),
  }),
  /** Chart file names inside `<store>.charts/` (null when not drawn). */
  charts: z.strictObject({ learning: z.string().nullable(), drivers: z.string().nullable() }),
});

export type GroupEmbeddingFile = z.infer<typeof groupEmbeddingSchema>;
export type EmbeddingSearchRow = z.infer<typeof searchRowSchema>;
export type EmbeddingDriver = z.infer<typeof driverSchema>;
