import { Adam } from './Adam.ts';
import { Autoencoder } from './Autoencoder.ts';
import { SeededRandom } from '../random/SeededRandom.ts';
import { shuffleInPlace } from '../random/shuffleInPlace.ts';
import { checkEmbedData, type EmbedData } from './EmbedData.ts';
import { evaluateReconstruction } from './evaluateReconstruction.ts';
import { createGradients, createWorkspace, loadRows, lossAndGradient } from './lossAndGradient.ts';
import { splitByPlayer, type PlayerSplit } from './splitByPlayer.ts';
import { resolveTrainOptions, type TrainOptions } from './TrainOptions.ts';

export interface LearningHistory {
  /** Per epoch: masked MSE of the training batches as trained (dropout on, running mean over the epoch). */
  readonly train: number[];
  /** Per epoch: masked MSE of the validation rows after the epoch (no dropout); the training rows when valFraction is 0. */
  readonly val: number[];
}

export interface TrainResult {
  /** The weights of the best epoch (lowest monitored loss). */
  readonly model: Autoencoder;
  readonly history: LearningHistory;
  /** 1-based epoch whose weights were kept. */
  readonly bestEpoch: number;
  /** 1-based last epoch run (maxEpochs when early stopping never fired). */
  readonly stoppedEpoch: number;
  readonly seconds: number;
  readonly split: PlayerSplit;
  readonly options: TrainOptions;
}

/**
 * Trains an autoencoder by mini-batch Adam on the masked reconstruction error (see `lossAndGradient`)
 * against each row's target (`data.y`: another season of the player for the cross-season objective,
 * else the row itself),
 * with a seeded validation split by player and early stopping (common practice; Prechelt 1998,
 * "Early stopping - but when?"):
 * - after each epoch the validation loss is measured; the weights are snapshotted whenever it reaches
 *   a new minimum, so the returned model always has the history's minimum validation loss;
 * - the patience counter resets only when the loss falls more than `minDelta` below the last
 *   significant level; after `patience` epochs without that, training stops.
 * A non-finite validation loss (divergence) stops training at once.
 * Deterministic for a seed: split, initial weights, batch order and dropout masks derive from it.
 * Cost per epoch about 3 * rows * (sum of layer in * out) multiply-adds.
 *
 * @example
 * const { model, bestEpoch, stoppedEpoch } = trainAutoencoder(data, { latent: 4, seed: 7 });
 * model.encode(data.x.subarray(0, data.d)); // the first row's 4-number code
 */
export function trainAutoencoder(data: EmbedData, partial: Partial<TrainOptions> = {}): TrainResult {
  const started = performance.now();
  checkEmbedData(data);
  const options = resolveTrainOptions(partial);
  const master = new SeededRandom(options.seed);
  const split = splitByPlayer(data.groups, options.valFraction, options.seed);
  const model = Autoencoder.initialise(
    { d: data.d, hidden: options.hidden, latent: options.latent, activation: options.activation },
    new SeededRandom(master.int(0x100000000)),
  );
  const orderRng = new SeededRandom(master.int(0x100000000));
  const dropout = options.dropout > 0 ? { rate: options.dropout, rng: new SeededRandom(master.int(0x100000000)) } : null;
  const adam = new Adam(model, options);
  const ws = createWorkspace(model, Math.min(options.batchSize, split.train.length));
  const grads = createGradients(model);
  const reg = { l2: options.l2, l1: options.l1 };
  const order = split.train.slice();
  const monitored = split.val.length > 0 ? split.val : split.train;

  const history: LearningHistory = { train: [], val: [] };
  let best = model.clone();
  let bestLoss = Infinity;
  let bestEpoch = 0;
  let reference = Infinity;
  let waited = 0;
  let epoch = 0;
  while (epoch < options.maxEpochs) {
    epoch++;
    shuffleInPlace(order, orderRng);
    let sse = 0;
    let present = 0;
    for (let from = 0; from < order.length; from += ws.capacity) {
      loadRows(ws, data.x, data.d, order, from, Math.min(order.length, from + ws.capacity), data.y);
      const batch = lossAndGradient(model, ws, reg, dropout, grads);
      adam.step(model, grads);
      sse += batch.sse;
      present += batch.present;
    }
    const valLoss = evaluateReconstruction(model, data, monitored);
    history.train.push(present > 0 ? sse / present : 0);
    history.val.push(valLoss);
    if (!Number.isFinite(valLoss)) break; // diverged: keep the best finite epoch
    if (valLoss < bestLoss) {
      bestLoss = valLoss;
      bestEpoch = epoch;
      best = model.clone();
    }
    if (valLoss < reference - options.minDelta) {
      reference = valLoss;
      waited = 0;
    } else if (++waited >= options.patience) {
      break;
    }
  }
  return {
    model: best,
    history,
    bestEpoch,
    stoppedEpoch: epoch,
    seconds: (performance.now() - started) / 1000,
    split,
    options,
  };
}
