import type { GroupProfiles } from '../profiles/buildProfiles.ts';
import type { EmbedData } from '../embed/EmbedData.ts';
import { GROUP_EMBEDDING_FORMAT, GROUP_EMBEDDING_VERSION, type GroupEmbeddingFile } from '../store/groupEmbeddingFile.ts';
import { groupChartNames, groupEmbeddingFileNames } from '../store/storeFileNames.ts';
import { pairScale } from '../embed/pairScale.ts';
import { learningCurveSvg } from '../embed/charts/learningCurveSvg.ts';
import { attributionSpreadSvg } from '../embed/charts/attributionSpreadSvg.ts';
import { float64ToBytes } from '../store/float64Bytes.ts';
import type { EmbeddingSpace } from '../embed/EmbeddingModel.ts';
import { attributionDrivers } from './attributionDrivers.ts';
import { embedGroup } from './embedGroup.ts';
import { scaledEncoder } from '../embed/scaledEncoder.ts';
import type { EmbedSettings } from './EmbedSettings.ts';

/**
 * Fewest rows a group needs to be embedded (a validation split, a PCA and a likeness scale need a
 * few dozen at least; a project choice). Smaller groups stay in the input space, and their queries say so.
 */
export const MIN_EMBED_ROWS = 40;

/** Random pairs drawn for the likeness scale. */
const PAIR_SCALE_PAIRS = 20_000;

/** What the embedding step adds to one group of the store. */
export interface EmbeddedGroup {
  readonly space: EmbeddingSpace;
  readonly dim: number;
  /** Index vectors: the codes as float32, n x dim. */
  readonly vectors: Float32Array;
  /** Store files (model, codes, summary) by name. */
  readonly files: Map<string, string | Uint8Array>;
  /** Chart files by name, for `<store>.charts/`. */
  readonly charts: Map<string, string>;
  readonly seconds: number;
}

/**
 * The embedding step of a build for one group: fits the embedding on the group's standardised profiles,
 * each dimension scaled by sqrt of its weight when `input` is 'weighted' (embedGroup), encodes every row, measures the likeness scale (pairScale), samples the pool-level
 * attribution summary (attributionDrivers), and renders the learning-curve (autoencoder) and driver
 * charts. Deterministic for the settings' seed (timings aside).
 */
export async function embedProfiles(g: GroupProfiles, settings: EmbedSettings): Promise<EmbeddedGroup> {
  const started = performance.now();
  const n = g.meta.length;
  const d = g.dims.length;
  const players = g.meta.map((m) => m.playerId);
  const scale = settings.input === 'weighted' ? Float64Array.from(g.redundancy, Math.sqrt) : new Float64Array(d).fill(1);
  const x = Float64Array.from(g.z, (v, i) => v * (scale[i % d] ?? 1));
  const data: EmbedData = { x, n, d, groups: players };
  const fitted = embedGroup(data, settings, g.meta.map((m) => m.season));
  const { dim, codes } = fitted;
  const encode = scaledEncoder((v) => fitted.model.model.encode(v), scale);
  const names = g.dims.map((x) => x.name);
  const drivers = attributionDrivers({ encode, z: g.z, codes, n, d, dim, players, names }, settings.driverTargets, settings.driverComps, settings.seed);
  const chartNames = groupChartNames(g.group);
  const charts = new Map<string, string>();
  if (fitted.kept) {
    const k = fitted.kept;
    const title = `${g.group}: autoencoder ${[d, ...k.hidden, k.size, ...[...k.hidden].reverse(), d].join('-')}`;
    charts.set(chartNames.learning, await learningCurveSvg(k.history, k.bestEpoch, title));
  }
  if (drivers.rows.length > 0) charts.set(chartNames.drivers, await attributionSpreadSvg(drivers.rows));
  const summary: GroupEmbeddingFile = {
    format: GROUP_EMBEDDING_FORMAT,
    version: GROUP_EMBEDDING_VERSION,
    group: g.group,
    space: fitted.model.space,
    d,
    dim,
    n,
    input_scale: Array.from(scale),
    pair_scale: n >= 2 ? pairScale(codes, n, dim, PAIR_SCALE_PAIRS, settings.seed) : 1,
    search: { rule: fitted.rule, rows: fitted.rows, chosen_size: dim, search_rows: fitted.searchRows },
    histories: fitted.histories.map((h) => ({
      size: h.size,
      hidden: h.hidden,
      best_epoch: h.bestEpoch,
      train: h.history.train.map(finiteOrNull),
      val: h.history.val.map(finiteOrNull),
    })),
    drivers: { targets: drivers.targets, comps: drivers.comps, dims: drivers.dims },
    training: { seconds: fitted.seconds, rows: n, settings: settingsRecord(settings) },
    charts: {
      learning: charts.has(chartNames.learning) ? chartNames.learning : null,
      drivers: charts.has(chartNames.drivers) ? chartNames.drivers : null,
    },
  };
  const fileNames = groupEmbeddingFileNames(g.group);
  const files = new Map<string, string | Uint8Array>([
    [fileNames.model, JSON.stringify(fitted.model.model.toJSON())],
    [fileNames.codes, float64ToBytes(codes)],
    [fileNames.summary, JSON.stringify(summary)],
  ]);
  return { space: fitted.model.space, dim, vectors: Float32Array.from(codes), files, charts, seconds: (performance.now() - started) / 1000 };
}

/** The settings as plain JSON for the manifest and the summary. */
export function settingsRecord(s: EmbedSettings): Record<string, unknown> {
  return {
    method: s.method,
    input: s.input,
    seed: s.seed,
    pcaVariance: s.pcaVariance,
    driverTargets: s.driverTargets,
    driverComps: s.driverComps,
    ...(s.method === 'autoencoder' ? { autoencoder: { ...s.autoencoder, hidden: s.autoencoder.hidden ? [...s.autoencoder.hidden] : null } } : {}),
  };
}

function finiteOrNull(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
