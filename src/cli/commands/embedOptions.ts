import { InvalidArgumentError, type Command } from 'commander';
import {
  DEFAULT_AUTOENCODER_SETTINGS,
  DEFAULT_EMBED_SETTINGS,
  EMBED_INPUTS,
  EMBED_METHODS,
  EMBED_OBJECTIVES,
  type EmbedObjective,
  type EmbedInput,
  type EmbedMethod,
  type EmbedSettingsInput,
} from '../../pipeline/EmbedSettings.ts';
import { ACTIVATIONS, type Activation } from '../../embed/activation.ts';

/**
 * The ranking space `kindred build` uses when --embed is not given. Chosen from
 * bench/embedQuality.bench.ts on simulated leagues (figures in docs/embedding.md).
 */
export const CLI_DEFAULT_EMBED: EmbedMethod = 'none';

/** Commander option parsers of the embedding step (each throws InvalidArgumentError, exit code 2). */
function method(value: string): EmbedMethod {
  const v = value.trim().toLowerCase();
  const found = EMBED_METHODS.find((m) => m === v);
  if (!found) throw new InvalidArgumentError(`expected ${EMBED_METHODS.join(', ')}, got "${value}"`);
  return found;
}

function wholeNumber(min: number): (value: string) => number {
  return (value: string) => {
    const n = Number(value);
    if (!/^\d+$/.test(value.trim()) || !Number.isSafeInteger(n) || n < min) throw new InvalidArgumentError(`expected a whole number of ${min} or more, got "${value}"`);
    return n;
  };
}

function nonNegative(value: string): number {
  const n = Number(value);
  if (value.trim() === '' || !Number.isFinite(n) || n < 0) throw new InvalidArgumentError(`expected a number of 0 or more, got "${value}"`);
  return n;
}

function positive(value: string): number {
  const n = nonNegative(value);
  if (n === 0) throw new InvalidArgumentError(`expected a number above 0, got "${value}"`);
  return n;
}

function share(open: boolean): (value: string) => number {
  return (value: string) => {
    const n = Number(value);
    const ok = value.trim() !== '' && Number.isFinite(n) && n >= 0 && (open ? n < 1 : n > 0 && n <= 1);
    if (!ok) throw new InvalidArgumentError(`expected a number ${open ? 'from 0 to below 1' : 'above 0, up to 1'}, got "${value}"`);
    return n;
  };
}

function hidden(value: string): number[] {
  const v = value.trim();
  if (v === '' || v === 'none') return [];
  const parts = v.split(',').map((s) => s.trim());
  if (parts.length > 2 || !parts.every((p) => /^\d+$/.test(p) && Number(p) >= 1)) {
    throw new InvalidArgumentError(`expected one or two hidden widths like 16 or 24,12 (or none), got "${value}"`);
  }
  return parts.map(Number);
}

function latent(value: string): number | 'search' {
  const v = value.trim().toLowerCase();
  if (v === 'search') return 'search';
  return wholeNumber(1)(v);
}

function embedInput(value: string): EmbedInput {
  const found = EMBED_INPUTS.find((x) => x === value.trim());
  if (!found) throw new InvalidArgumentError(`expected ${EMBED_INPUTS.join(' or ')}, got "${value}"`);
  return found;
}

function objective(value: string): EmbedObjective {
  const found = EMBED_OBJECTIVES.find((x) => x === value.trim().toLowerCase());
  if (!found) throw new InvalidArgumentError(`expected ${EMBED_OBJECTIVES.join(' or ')}, got "${value}"`);
  return found;
}

function activation(value: string): Activation {
  const found = ACTIVATIONS.find((a) => a === value.trim());
  if (!found) throw new InvalidArgumentError(`expected ${ACTIVATIONS.join(', ')}, got "${value}"`);
  return found;
}

/** Adds --embed and the training settings to a command. */
export function addEmbedOptions(cmd: Command): Command {
  const a = DEFAULT_AUTOENCODER_SETTINGS;
  return cmd
    .option('--embed <space>', 'rank comps in: none (the weighted input space), pca or autoencoder', method, CLI_DEFAULT_EMBED)
    .option('--seed <n>', 'seed of the embedding (split, weights, batches, samples)', wholeNumber(0), DEFAULT_EMBED_SETTINGS.seed)
    .option('--pca-variance <share>', 'PCA: keep the fewest components reaching this share of variance', share(false), DEFAULT_EMBED_SETTINGS.pcaVariance)
    .option('--objective <name>', 'autoencoder target: reconstruct (the profile itself) or cross-season (the same player\'s nearest other season)', objective, a.objective)
    .option('--hidden <widths>', 'autoencoder hidden widths, e.g. 16 or 24,12 (default: the search ladder, or 16)', hidden)
    .option('--latent <n|search>', 'autoencoder code size, or search (grow while validation improves)', latent, a.latent)
    .option('--activation <name>', `autoencoder hidden activation: ${ACTIVATIONS.join(', ')}`, activation, a.activation)
    .option('--learning-rate <x>', 'Adam step size', positive, a.learningRate)
    .option('--batch <n>', 'rows per mini-batch', wholeNumber(1), a.batchSize)
    .option('--max-epochs <n>', 'most epochs per training', wholeNumber(1), a.maxEpochs)
    .option('--patience <n>', 'epochs without improvement before stopping', wholeNumber(1), a.patience)
    .option('--min-delta <x>', 'least fall in validation loss that counts as improvement', nonNegative, a.minDelta)
    .option('--l2 <x>', 'L2 weight penalty', nonNegative, a.l2)
    .option('--l1 <x>', 'L1 weight penalty', nonNegative, a.l1)
    .option('--dropout <rate>', 'dropout on hidden layers while training', share(true), a.dropout)
    .option('--val-fraction <share>', 'share of rows (whole players) held out for validation', share(true), a.valFraction)
    .option('--margin <share>', 'capacity search: least relative validation gain for the next size', nonNegative, a.margin)
    .option('--search-rows <n>', 'capacity search on at most this many rows (whole players)', wholeNumber(2), a.searchRows)
    .option('--embed-input <input>', 'fit the embedding on weighted (sqrt of the comps weights times z) or plain z profiles', embedInput, DEFAULT_EMBED_SETTINGS.input)
    .option('--drivers <targets>', 'random targets (x 10 comps each) for the "what drives comps" summary; 0 = none', wholeNumber(0), DEFAULT_EMBED_SETTINGS.driverTargets);
}

/** The values commander collected, as build settings. */
export interface EmbedOptionValues {
  readonly embed: EmbedMethod;
  readonly seed: number;
  readonly pcaVariance: number;
  readonly objective: EmbedObjective;
  readonly hidden?: number[] | undefined;
  readonly latent: number | 'search';
  readonly activation: Activation;
  readonly learningRate: number;
  readonly batch: number;
  readonly maxEpochs: number;
  readonly patience: number;
  readonly minDelta: number;
  readonly l2: number;
  readonly l1: number;
  readonly dropout: number;
  readonly valFraction: number;
  readonly margin: number;
  readonly searchRows: number;
  readonly embedInput: EmbedInput;
  readonly drivers: number;
}

export function embedSettingsFrom(o: EmbedOptionValues): EmbedSettingsInput {
  return {
    method: o.embed,
    input: o.embedInput,
    seed: o.seed,
    driverTargets: o.drivers,
    pcaVariance: o.pcaVariance,
    autoencoder: {
      objective: o.objective,
      hidden: o.hidden ?? null,
      latent: o.latent,
      activation: o.activation,
      learningRate: o.learningRate,
      batchSize: o.batch,
      maxEpochs: o.maxEpochs,
      patience: o.patience,
      minDelta: o.minDelta,
      l2: o.l2,
      l1: o.l1,
      dropout: o.dropout,
      valFraction: o.valFraction,
      margin: o.margin,
      searchRows: o.searchRows,
    },
  };
}
