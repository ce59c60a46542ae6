import { UsageError } from '../errors/KindredError.ts';
import type { EmbedData } from '../embed/EmbedData.ts';
import type { EmbeddingModel } from '../embed/EmbeddingModel.ts';
import { modelCodeSize } from '../embed/EmbeddingModel.ts';
import type { EmbeddingSearchRow } from '../store/groupEmbeddingFile.ts';
import { fitPcaEmbedding } from '../embed/fitPcaEmbedding.ts';
import { chooseComponents } from '../embed/chooseComponents.ts';
import { PcaEmbedding } from '../embed/PcaEmbedding.ts';
import { pcaLossByComponents } from '../embed/pcaLossByComponents.ts';
import { splitByPlayer } from '../embed/splitByPlayer.ts';
import { sampleByPlayer } from '../embed/sampleByPlayer.ts';
import { DEFAULT_CAPACITY_STEPS, searchCapacity, type CapacityStep } from '../embed/searchCapacity.ts';
import { trainAutoencoder, type LearningHistory } from '../embed/trainAutoencoder.ts';
import type { TrainOptions } from '../embed/TrainOptions.ts';
import { crossSeasonPairs } from '../embed/crossSeasonPairs.ts';
import { isometricCode } from '../embed/isometricCode.ts';
import type { EmbedSettings } from './EmbedSettings.ts';

/** Latent sizes tried by the capacity search when the hidden widths are fixed by the user. */
const SEARCH_LATENTS = [2, 3, 4, 6, 8];
/** Hidden width of a fixed-latent autoencoder when none is given. */
const DEFAULT_HIDDEN = [16];
/** Fewest cross-season pairs to train on; below it the group's autoencoder reconstructs its profiles instead (a project choice). */
export const MIN_CROSS_SEASON_PAIRS = 40;

export interface GroupHistory {
  readonly size: number;
  readonly hidden: number[];
  readonly bestEpoch: number;
  readonly history: LearningHistory;
}

/** A fitted embedding of one group and how it was chosen. */
export interface GroupEmbedding {
  readonly model: EmbeddingModel;
  readonly dim: number;
  /** Every row's code, n x dim. */
  readonly codes: Float64Array;
  readonly rule: string;
  readonly searchRows: number;
  readonly rows: EmbeddingSearchRow[];
  /** Histories of every size tried, then (when the search ran on a sample) the final training on every row. */
  readonly histories: GroupHistory[];
  /** The history of the model kept (null for PCA). */
  readonly kept: GroupHistory | null;
  readonly seconds: number;
}

/**
 * Fits the embedding of one position group on its standardised profiles (`data.x` = z, NaN = missing,
 * `data.groups` = player ids):
 * - PCA: components of a fit on the training players (split by player, valFraction) give the table of
 *   train and validation reconstruction error per size; the size is the smallest whose cumulative
 *   share of variance reaches `pcaVariance` (chooseComponents); the kept model is refitted on every row.
 * - autoencoder with latent 'search': the capacity search (searchCapacity, margin) on a sample of whole
 *   players of at most `searchRows` rows; if that was a sample, the chosen size is trained again on
 *   every row. With a fixed latent, one training on every row.
 * - the autoencoder's objective `cross-season` (needs `seasons`, one per row): the same, trained on
 *   the pairs of crossSeasonPairs (each row against the same player's nearest other seasons) instead
 *   of the rows themselves; "row" above then reads "pair"; the kept code is then made isometric to the
 *   decoder's first layer (isometricCode). With fewer than MIN_CROSS_SEASON_PAIRS pairs
 *   the group falls back to reconstruction, and its rule says so. Every row is then encoded.
 * Sizes are capped at d - 1 (a code as wide as the input compresses nothing). Deterministic for a seed.
 */
export function embedGroup(data: EmbedData, settings: EmbedSettings, seasons?: ArrayLike<number>): GroupEmbedding {
  const started = performance.now();
  if (data.d < 2) throw new UsageError(`embedding: ${data.d} dimension (expected at least 2 to compress)`);
  if (data.n < 4) throw new UsageError(`embedding: ${data.n} rows (expected at least 4)`);
  const result = settings.method === 'pca' ? embedPca(data, settings) : embedAutoencoderFor(data, settings, seasons);
  const dim = modelCodeSize(result.model);
  const codes = new Float64Array(data.n * dim);
  for (let i = 0; i < data.n; i++) codes.set(result.model.model.encode(data.x.subarray(i * data.d, (i + 1) * data.d)), i * dim);
  return { ...result, dim, codes, seconds: (performance.now() - started) / 1000 };
}

type Fitted = Omit<GroupEmbedding, 'dim' | 'codes' | 'seconds'>;

function embedPca(data: EmbedData, settings: EmbedSettings): Fitted {
  const split = splitByPlayer(data.groups, settings.autoencoder.valFraction, settings.seed);
  const maxK = data.d - 1;
  const trainData = subset(data, split.train);
  const trial = fitPcaEmbedding(trainData, data.d);
  const trainLoss = pcaLossByComponents(trial, data, split.train);
  const valLoss = split.val.length > 0 ? pcaLossByComponents(trial, data, split.val) : null;
  const shares = Array.from(trial.explainedVariance);
  const k = Math.min(maxK, chooseComponents(shares, settings.pcaVariance));
  let running = 0;
  const rows: EmbeddingSearchRow[] = [];
  for (let q = 1; q <= maxK; q++) {
    running += shares[q - 1] ?? 0;
    rows.push({
      size: q,
      hidden: [],
      epochs: null,
      train_loss: finiteOrNull(trainLoss[q - 1]),
      val_loss: valLoss ? finiteOrNull(valLoss[q - 1]) : null,
      explained: running,
      chosen: q === k,
    });
  }
  const full = fitPcaEmbedding(data, data.d);
  const model = new PcaEmbedding(data.d, k, full.mean, full.components.slice(0, k * data.d), full.explainedVariance);
  return {
    model: { space: 'pca', model },
    rule: `smallest number of components whose cumulative share of variance reaches ${settings.pcaVariance} (fitted on the training players; kept model refitted on every row)`,
    searchRows: split.train.length,
    rows,
    histories: [],
    kept: null,
  };
}

function embedAutoencoderFor(data: EmbedData, settings: EmbedSettings, seasons: ArrayLike<number> | undefined): Fitted {
  if (settings.autoencoder.objective !== 'cross-season') return embedAutoencoder(data, settings);
  if (!seasons) throw new UsageError('embedding: the cross-season objective needs each row\'s season');
  const pairs = crossSeasonPairs(data, seasons);
  if (pairs.n < MIN_CROSS_SEASON_PAIRS) {
    const fitted = embedAutoencoder(data, settings);
    return { ...fitted, rule: `${fitted.rule} (reconstruction: ${pairs.n} cross-season pairs, fewer than ${MIN_CROSS_SEASON_PAIRS})` };
  }
  const fitted = embedAutoencoder({ x: pairs.x, y: pairs.y, n: pairs.n, d: pairs.d, groups: pairs.groups }, settings, 'pair');
  if (fitted.model.space !== 'autoencoder') return fitted;
  return {
    ...fitted,
    model: { space: 'autoencoder', model: isometricCode(fitted.model.model) },
    rule: `cross-season objective (${pairs.n} pairs: a row and the same player's nearest other season); ${fitted.rule}; code distances made the decoder's (isometric code)`,
  };
}

/** `unit` names what data's rows are in the rule: profiles ('row') or cross-season pairs ('pair'). */
function embedAutoencoder(data: EmbedData, settings: EmbedSettings, unit: 'row' | 'pair' = 'row'): Fitted {
  const a = settings.autoencoder;
  const train: Omit<TrainOptions, 'latent' | 'hidden'> = {
    activation: a.activation,
    learningRate: a.learningRate,
    beta1: 0.9,
    beta2: 0.999,
    epsilon: 1e-8,
    batchSize: a.batchSize,
    maxEpochs: a.maxEpochs,
    patience: a.patience,
    minDelta: a.minDelta,
    l2: a.l2,
    l1: a.l1,
    dropout: a.dropout,
    valFraction: a.valFraction,
    seed: settings.seed,
  };
  const maxLatent = data.d - 1;
  if (a.latent !== 'search') {
    const latent = Math.min(a.latent, maxLatent);
    const hidden = [...(a.hidden ?? DEFAULT_HIDDEN)];
    const r = trainAutoencoder(data, { ...train, latent, hidden });
    const kept: GroupHistory = { size: latent, hidden, bestEpoch: r.bestEpoch, history: r.history };
    return {
      model: { space: 'autoencoder', model: r.model },
      rule: `fixed latent size ${latent}`,
      searchRows: data.n,
      rows: [row(latent, hidden, r.stoppedEpoch, r.history, r.bestEpoch, a.valFraction > 0)],
      histories: [kept],
      kept,
    };
  }
  const ladder: CapacityStep[] = a.hidden
    ? SEARCH_LATENTS.map((latent) => ({ latent, hidden: [...(a.hidden ?? [])] }))
    : DEFAULT_CAPACITY_STEPS.map((s) => ({ latent: s.latent, hidden: [...s.hidden] }));
  const steps = ladder.filter((s) => s.latent <= maxLatent);
  if (steps.length === 0) steps.push({ latent: Math.max(1, maxLatent), hidden: [...(a.hidden ?? DEFAULT_HIDDEN)] });
  const sampleRows = sampleByPlayer(data.groups, a.searchRows, settings.seed);
  const sampled = sampleRows.length < data.n;
  const searchData = sampled ? subset(data, sampleRows) : data;
  const search = searchCapacity(searchData, { ...train, steps, margin: a.margin });
  const histories: GroupHistory[] = search.histories.map((h) => ({
    size: h.step.latent,
    hidden: [...h.step.hidden],
    bestEpoch: h.bestEpoch,
    history: h.history,
  }));
  const rows = search.rows.map((r) => ({
    size: r.latent,
    hidden: r.hidden,
    epochs: r.epochs,
    train_loss: finiteOrNull(r.trainLoss),
    val_loss: a.valFraction > 0 ? finiteOrNull(r.valLoss) : null,
    explained: null,
    chosen: r.chosen,
  }));
  const choice = histories[search.chosen];
  if (!choice) throw new UsageError('embedding: the capacity search chose nothing');
  const rule = `capacity search: next size only while the best validation loss improves by at least ${a.margin * 100}% relative`;
  if (!sampled) {
    return { model: { space: 'autoencoder', model: search.model }, rule, searchRows: searchData.n, rows, histories, kept: choice };
  }
  const final = trainAutoencoder(data, { ...train, latent: choice.size, hidden: choice.hidden });
  const kept: GroupHistory = { size: choice.size, hidden: choice.hidden, bestEpoch: final.bestEpoch, history: final.history };
  return {
    model: { space: 'autoencoder', model: final.model },
    rule: `${rule}, on ${searchData.n} of ${data.n} ${unit}s (whole players); the chosen size then trained on every ${unit}`,
    searchRows: searchData.n,
    rows,
    histories: [...histories, kept],
    kept,
  };
}

function row(size: number, hidden: number[], epochs: number, h: LearningHistory, bestEpoch: number, validated: boolean): EmbeddingSearchRow {
  return {
    size,
    hidden,
    epochs,
    train_loss: finiteOrNull(h.train[bestEpoch - 1]),
    val_loss: validated ? finiteOrNull(h.val[bestEpoch - 1]) : null,
    explained: null,
    chosen: true,
  };
}

/** JSON has no NaN or Infinity: a loss that is not a finite number (a diverged run) is stored as null. */
function finiteOrNull(x: number | undefined): number | null {
  return x !== undefined && Number.isFinite(x) ? x : null;
}

function subset(data: EmbedData, rows: Int32Array): EmbedData {
  const x = new Float64Array(rows.length * data.d);
  const groups: string[] = [];
  rows.forEach((r, i) => {
    x.set(data.x.subarray(r * data.d, (r + 1) * data.d), i * data.d);
    groups.push(data.groups[r] ?? '');
  });
  return { x, n: rows.length, d: data.d, groups };
}
