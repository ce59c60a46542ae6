import { UsageError } from '../errors/KindredError.ts';
import { DEFAULT_TRAIN_OPTIONS, resolveTrainOptions, type TrainOptions } from '../embed/TrainOptions.ts';

/** Which space a store's comps are ranked in. */
export type EmbedMethod = 'none' | 'pca' | 'autoencoder';

export const EMBED_METHODS: readonly EmbedMethod[] = ['none', 'pca', 'autoencoder'];

/** Training settings a build passes on as they are (each documented in src/embed/TrainOptions.ts). */
type PassedTrainOptions = Pick<
  TrainOptions,
  'activation' | 'learningRate' | 'batchSize' | 'maxEpochs' | 'patience' | 'minDelta' | 'l2' | 'l1' | 'dropout' | 'valFraction'
>;

/**
 * What the autoencoder learns to give back: `reconstruct`, the profile itself (a plain autoencoder), or
 * `cross-season`, the same player's nearest other season (src/embed/crossSeasonPairs.ts), so that its
 * code keeps what persists from season to season and drops one season's luck; its code is then
 * re-expressed so that code distances are the decoder's (src/embed/isometricCode.ts).
 */
export type EmbedObjective = 'reconstruct' | 'cross-season';

export const EMBED_OBJECTIVES: readonly EmbedObjective[] = ['reconstruct', 'cross-season'];

/** Autoencoder settings of a build: the training settings plus the network size and the capacity search. */
export interface AutoencoderSettings extends PassedTrainOptions {
  /** The training target (default `reconstruct`). */
  readonly objective: EmbedObjective;
  /** Encoder hidden widths; null = the capacity ladder's widths (DEFAULT_CAPACITY_STEPS) or [16] for a fixed latent. */
  readonly hidden: readonly number[] | null;
  /** Code size, or 'search' for the capacity search. */
  readonly latent: number | 'search';
  /** Capacity search: least relative gain in validation loss that justifies the next size. */
  readonly margin: number;
  /** Capacity search on a sample of whole players of at most this many rows; the chosen size is then trained on every row. */
  readonly searchRows: number;
}

/** What the embedding is fitted on: the standardised profiles z, or the weighted ones sqrt(w) z (the input space's weights). */
export type EmbedInput = 'z' | 'weighted';

export const EMBED_INPUTS: readonly EmbedInput[] = ['z', 'weighted'];

export interface EmbedSettings {
  readonly method: EmbedMethod;
  readonly input: EmbedInput;
  /** Seed of every random choice of the embedding step (split, weights, batches, samples). */
  readonly seed: number;
  /** PCA: smallest cumulative share of variance the kept components reach. */
  readonly pcaVariance: number;
  readonly autoencoder: AutoencoderSettings;
  /** Pool-level attribution summary: random targets, and comps per target. */
  readonly driverTargets: number;
  readonly driverComps: number;
}

export const DEFAULT_AUTOENCODER_SETTINGS: AutoencoderSettings = {
  objective: 'reconstruct',
  hidden: null,
  latent: 'search',
  activation: DEFAULT_TRAIN_OPTIONS.activation,
  learningRate: DEFAULT_TRAIN_OPTIONS.learningRate,
  batchSize: DEFAULT_TRAIN_OPTIONS.batchSize,
  maxEpochs: DEFAULT_TRAIN_OPTIONS.maxEpochs,
  patience: DEFAULT_TRAIN_OPTIONS.patience,
  minDelta: DEFAULT_TRAIN_OPTIONS.minDelta,
  l2: DEFAULT_TRAIN_OPTIONS.l2,
  l1: DEFAULT_TRAIN_OPTIONS.l1,
  dropout: DEFAULT_TRAIN_OPTIONS.dropout,
  valFraction: DEFAULT_TRAIN_OPTIONS.valFraction,
  margin: 0.02,
  searchRows: 20_000,
};

/** The library default is no embedding (the CLI's default is set in src/cli/commands/buildCommand.ts). */
export const DEFAULT_EMBED_SETTINGS: EmbedSettings = {
  method: 'none',
  input: 'weighted',
  seed: 1,
  pcaVariance: 0.9,
  autoencoder: DEFAULT_AUTOENCODER_SETTINGS,
  driverTargets: 100,
  driverComps: 10,
};

export type EmbedSettingsInput = Partial<Omit<EmbedSettings, 'autoencoder'>> & { readonly autoencoder?: Partial<AutoencoderSettings> };

/**
 * Defaults filled in and every value checked (UsageError naming the setting, the value and the range);
 * the training settings are checked by resolveTrainOptions.
 *
 * @example
 * resolveEmbedSettings({ method: 'pca' }).pcaVariance; // => 0.9
 */
export function resolveEmbedSettings(input: EmbedSettingsInput = {}): EmbedSettings {
  const autoencoder: AutoencoderSettings = { ...DEFAULT_AUTOENCODER_SETTINGS, ...(input.autoencoder ?? {}) };
  const s: EmbedSettings = { ...DEFAULT_EMBED_SETTINGS, ...input, autoencoder };
  const bad = (name: string, value: unknown, expected: string): never => {
    throw new UsageError(`embedding setting ${name} ${JSON.stringify(value)} (expected ${expected})`, { option: name });
  };
  const isCount = (v: number): boolean => Number.isInteger(v) && v >= 0;
  if (!EMBED_METHODS.includes(s.method)) bad('method', s.method, EMBED_METHODS.join(', '));
  if (!EMBED_INPUTS.includes(s.input)) bad('input', s.input, EMBED_INPUTS.join(', '));
  if (!Number.isFinite(s.seed)) bad('seed', s.seed, 'a finite number');
  if (!(s.pcaVariance > 0 && s.pcaVariance <= 1)) bad('pcaVariance', s.pcaVariance, '0 < share <= 1');
  if (!isCount(s.driverTargets)) bad('driverTargets', s.driverTargets, 'a whole number >= 0');
  if (!(Number.isInteger(s.driverComps) && s.driverComps >= 1)) bad('driverComps', s.driverComps, 'a positive whole number');
  if (!EMBED_OBJECTIVES.includes(autoencoder.objective)) bad('objective', autoencoder.objective, EMBED_OBJECTIVES.join(', '));
  if (autoencoder.latent !== 'search' && !(Number.isInteger(autoencoder.latent) && autoencoder.latent >= 1)) {
    bad('latent', autoencoder.latent, 'a positive whole number or "search"');
  }
  if (!(autoencoder.margin >= 0 && Number.isFinite(autoencoder.margin))) bad('margin', autoencoder.margin, 'a number >= 0');
  if (!(Number.isInteger(autoencoder.searchRows) && autoencoder.searchRows >= 2)) bad('searchRows', autoencoder.searchRows, 'a whole number >= 2');
  resolveTrainOptions({
    ...(autoencoder.hidden ? { hidden: autoencoder.hidden } : {}),
    activation: autoencoder.activation,
    learningRate: autoencoder.learningRate,
    batchSize: autoencoder.batchSize,
    maxEpochs: autoencoder.maxEpochs,
    patience: autoencoder.patience,
    minDelta: autoencoder.minDelta,
    l2: autoencoder.l2,
    l1: autoencoder.l1,
    dropout: autoencoder.dropout,
    valFraction: autoencoder.valFraction,
    seed: s.seed,
  });
  return s;
}
