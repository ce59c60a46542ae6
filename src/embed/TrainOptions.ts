import { UsageError } from '../errors/KindredError.ts';
import { ACTIVATIONS, type Activation } from './activation.ts';
import { MAX_HIDDEN_LAYERS } from './Autoencoder.ts';

/** Every setting of `trainAutoencoder`, with the defaults in `DEFAULT_TRAIN_OPTIONS`. */
export interface TrainOptions {
  /** Encoder hidden widths, 0 to 2 layers; the decoder mirrors them. Default [16]. */
  readonly hidden: readonly number[];
  /** Code size. Default 4. */
  readonly latent: number;
  /** Hidden-layer activation. Default 'tanh'. */
  readonly activation: Activation;
  /** Adam step size. Default 2e-3. */
  readonly learningRate: number;
  /** Adam beta1, default 0.9; beta2, default 0.999; epsilon, default 1e-8 (Kingma and Ba 2015). */
  readonly beta1: number;
  readonly beta2: number;
  readonly epsilon: number;
  /** Rows per mini-batch. Default 256. */
  readonly batchSize: number;
  /** Upper bound on epochs. Default 200. */
  readonly maxEpochs: number;
  /** Epochs without a significant improvement before stopping. Default 10. */
  readonly patience: number;
  /** Smallest decrease of the validation loss (absolute, loss units) that resets the patience. Default 1e-4. */
  readonly minDelta: number;
  /** L2 penalty (l2 / 2) * sum w^2 on weights, not biases. Default 1e-4. */
  readonly l2: number;
  /** L1 penalty l1 * sum |w| on weights. Default 0. */
  readonly l1: number;
  /** Inverted-dropout rate on hidden layers, training only. Default 0.1. */
  readonly dropout: number;
  /** Share of rows (whole players) held out for validation. Default 0.2; 0 monitors the training rows. */
  readonly valFraction: number;
  /** Seed of the split, the initial weights, the batch order and the dropout masks. Default 1. */
  readonly seed: number;
}

export const DEFAULT_TRAIN_OPTIONS: TrainOptions = {
  hidden: [16],
  latent: 4,
  activation: 'tanh',
  learningRate: 2e-3,
  beta1: 0.9,
  beta2: 0.999,
  epsilon: 1e-8,
  batchSize: 256,
  maxEpochs: 200,
  patience: 10,
  minDelta: 1e-4,
  l2: 1e-4,
  l1: 0,
  dropout: 0.1,
  valFraction: 0.2,
  seed: 1,
};

/**
 * Defaults filled in and every value checked (UsageError naming the option, the value and the range).
 *
 * @example
 * resolveTrainOptions({ latent: 6 }).hidden; // => [16]
 */
export function resolveTrainOptions(partial: Partial<TrainOptions> = {}): TrainOptions {
  const o: TrainOptions = { ...DEFAULT_TRAIN_OPTIONS, ...partial };
  const bad = (name: string, value: unknown, expected: string): never => {
    throw new UsageError(`autoencoder option ${name} ${JSON.stringify(value)} (expected ${expected})`, { option: name });
  };
  const posInt = (v: number): boolean => Number.isInteger(v) && v > 0;
  if (o.hidden.length > MAX_HIDDEN_LAYERS || !o.hidden.every(posInt)) bad('hidden', o.hidden, `0 to ${MAX_HIDDEN_LAYERS} positive integers`);
  if (!posInt(o.latent)) bad('latent', o.latent, 'a positive integer');
  if (!ACTIVATIONS.includes(o.activation)) bad('activation', o.activation, ACTIVATIONS.join(', '));
  if (!(o.learningRate > 0 && Number.isFinite(o.learningRate))) bad('learningRate', o.learningRate, 'a positive number');
  if (!(o.beta1 >= 0 && o.beta1 < 1)) bad('beta1', o.beta1, '0 <= beta1 < 1');
  if (!(o.beta2 >= 0 && o.beta2 < 1)) bad('beta2', o.beta2, '0 <= beta2 < 1');
  if (!(o.epsilon > 0)) bad('epsilon', o.epsilon, 'a positive number');
  if (!posInt(o.batchSize)) bad('batchSize', o.batchSize, 'a positive integer');
  if (!posInt(o.maxEpochs)) bad('maxEpochs', o.maxEpochs, 'a positive integer');
  if (!posInt(o.patience)) bad('patience', o.patience, 'a positive integer');
  if (!(o.minDelta >= 0)) bad('minDelta', o.minDelta, 'a number >= 0');
  if (!(o.l2 >= 0)) bad('l2', o.l2, 'a number >= 0');
  if (!(o.l1 >= 0)) bad('l1', o.l1, 'a number >= 0');
  if (!(o.dropout >= 0 && o.dropout < 1)) bad('dropout', o.dropout, '0 <= dropout < 1');
  if (!(o.valFraction >= 0 && o.valFraction < 1)) bad('valFraction', o.valFraction, '0 <= valFraction < 1');
  if (!Number.isFinite(o.seed)) bad('seed', o.seed, 'a finite number');
  return { ...o, hidden: [...o.hidden] };
}
