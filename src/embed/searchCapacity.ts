import { UsageError } from '../errors/KindredError.ts';
import type { Autoencoder } from './Autoencoder.ts';
import type { EmbedData } from './EmbedData.ts';
import { trainAutoencoder, type LearningHistory, type TrainResult } from './trainAutoencoder.ts';
import type { TrainOptions } from './TrainOptions.ts';

/** One network size to try. */
export interface CapacityStep {
  readonly latent: number;
  readonly hidden: readonly number[];
}

/** Default ladder: latent and hidden width grow together, from small (latent 2, hidden 8). */
export const DEFAULT_CAPACITY_STEPS: readonly CapacityStep[] = [
  { latent: 2, hidden: [8] },
  { latent: 3, hidden: [12] },
  { latent: 4, hidden: [16] },
  { latent: 6, hidden: [24] },
  { latent: 8, hidden: [32] },
];

export type CapacityOptions = Partial<Omit<TrainOptions, 'latent' | 'hidden'>> & {
  readonly steps?: readonly CapacityStep[];
  /** Smallest relative improvement of the best validation loss that justifies the next size (e.g. 0.02 = 2%). */
  readonly margin: number;
};

export interface CapacityRow {
  readonly latent: number;
  readonly hidden: number[];
  /** Epochs run. */
  readonly epochs: number;
  /** Training loss (as trained) at the kept epoch. */
  readonly trainLoss: number;
  /** Best validation loss. */
  readonly valLoss: number;
  readonly chosen: boolean;
}

export interface CapacityResult {
  readonly model: Autoencoder;
  /** Index of the chosen step in `rows`. */
  readonly chosen: number;
  readonly rows: CapacityRow[];
  /** Learning history of every step tried, in order. */
  readonly histories: { readonly step: CapacityStep; readonly history: LearningHistory; readonly bestEpoch: number }[];
  readonly seconds: number;
}

/**
 * Capacity search (common practice: grow the model until validation stops paying): train each step
 * in order with the same seed (so the same player split); move on only while the best validation
 * loss improves on the best so far by at least `margin` relative, (best - val) / best >= margin;
 * stop at the first step that does not, and keep the last step that did.
 *
 * @example
 * const { model, rows } = searchCapacity(data, { margin: 0.02, seed: 3 });
 * rows.filter((r) => r.chosen).length; // => 1
 */
export function searchCapacity(data: EmbedData, options: CapacityOptions): CapacityResult {
  const started = performance.now();
  const { steps = DEFAULT_CAPACITY_STEPS, margin, ...train } = options;
  if (steps.length === 0) throw new UsageError('searchCapacity: no steps (expected at least one network size)');
  if (!(margin >= 0 && Number.isFinite(margin))) throw new UsageError(`searchCapacity: margin ${margin} (expected a number >= 0)`);
  const results: TrainResult[] = [];
  let chosen = 0;
  for (const step of steps) {
    const result = trainAutoencoder(data, { ...train, latent: step.latent, hidden: step.hidden });
    results.push(result);
    if (results.length === 1) continue;
    const bestSoFar = bestVal(results[chosen]);
    const val = bestVal(result);
    if ((bestSoFar - val) / bestSoFar >= margin) chosen = results.length - 1;
    else break;
  }
  const rows = results.map((r, i) => ({
    latent: r.options.latent,
    hidden: [...r.options.hidden],
    epochs: r.stoppedEpoch,
    trainLoss: r.history.train[r.bestEpoch - 1] ?? NaN,
    valLoss: bestVal(r),
    chosen: i === chosen,
  }));
  const histories = results.map((r, i) => ({ step: steps[i] ?? { latent: r.options.latent, hidden: r.options.hidden }, history: r.history, bestEpoch: r.bestEpoch }));
  const pick = results[chosen];
  if (!pick) throw new UsageError('searchCapacity: nothing trained');
  return { model: pick.model, chosen, rows, histories, seconds: (performance.now() - started) / 1000 };
}

function bestVal(r: TrainResult | undefined): number {
  return r ? (r.history.val[r.bestEpoch - 1] ?? Infinity) : Infinity;
}
