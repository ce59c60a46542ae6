import { z } from 'zod';
import { StoreError } from '../errors/KindredError.ts';
import { UsageError } from '../errors/KindredError.ts';
import { ACTIVATIONS, activateInPlace, type Activation } from './activation.ts';
import type { Rng } from '../random/Rng.ts';

/** The architecture: d inputs, 0 to 2 hidden layers, a linear latent layer, a mirrored decoder, linear output. */
export interface AutoencoderShape {
  readonly d: number;
  /** Widths of the encoder's hidden layers (the decoder mirrors them). */
  readonly hidden: readonly number[];
  readonly latent: number;
  readonly activation: Activation;
}

/** A fully connected layer: out = act(in . W + b), W row-major in x out. */
export interface DenseLayer {
  readonly inSize: number;
  readonly outSize: number;
  readonly weights: Float64Array;
  readonly bias: Float64Array;
  /** `identity` for the latent and the output layer. */
  readonly activation: Activation;
  /** True for hidden layers, whose outputs take dropout during training. */
  readonly hiddenLayer: boolean;
}

export const AUTOENCODER_FORMAT = 'kindred-autoencoder';
export const AUTOENCODER_VERSION = 1;
/** Largest number of encoder hidden layers. */
export const MAX_HIDDEN_LAYERS = 2;

export interface AutoencoderJson {
  readonly format: typeof AUTOENCODER_FORMAT;
  readonly version: typeof AUTOENCODER_VERSION;
  readonly d: number;
  readonly hidden: number[];
  readonly latent: number;
  readonly activation: Activation;
  /** One entry per layer, encoder first: weights row-major (in x out). */
  readonly layers: { readonly inSize: number; readonly outSize: number; readonly weights: number[]; readonly bias: number[] }[];
}

const positiveInt = z.number().int().positive();
const jsonSchema = z.object({
  format: z.literal(AUTOENCODER_FORMAT),
  version: z.number(),
  d: positiveInt,
  hidden: z.array(positiveInt).max(MAX_HIDDEN_LAYERS),
  latent: positiveInt,
  activation: z.enum(['tanh', 'relu', 'identity']),
  layers: z.array(
    z.object({
      inSize: positiveInt,
      outSize: positiveInt,
      weights: z.array(z.number()),
      bias: z.array(z.number()),
    }),
  ),
});

/** Layer widths from input to output: [d, ...hidden, latent, ...reversed hidden, d]. */
export function layerSizes(shape: AutoencoderShape): number[] {
  return [shape.d, ...shape.hidden, shape.latent, ...[...shape.hidden].reverse(), shape.d];
}

function shapeProblem(shape: AutoencoderShape): string | null {
  const isPos = (v: number): boolean => Number.isInteger(v) && v > 0;
  if (!isPos(shape.d)) return `d ${shape.d} (expected a positive integer)`;
  if (!isPos(shape.latent)) return `latent ${shape.latent} (expected a positive integer)`;
  if (shape.hidden.length > MAX_HIDDEN_LAYERS) return `${shape.hidden.length} hidden layers (expected 0 to ${MAX_HIDDEN_LAYERS})`;
  for (const h of shape.hidden) if (!isPos(h)) return `hidden width ${h} (expected a positive integer)`;
  if (!ACTIVATIONS.includes(shape.activation)) return `activation ${JSON.stringify(shape.activation)} (expected one of ${ACTIVATIONS.join(', ')})`;
  return null;
}

/**
 * An autoencoder on typed arrays. Missing inputs (NaN) are fed as 0, the stratum mean of a z-score.
 * Built complete by `initialise` (seeded random weights) or `fromJSON` (validated), never half-made.
 *
 * @example
 * const ae = Autoencoder.initialise({ d: 3, hidden: [4], latent: 2, activation: 'tanh' }, new SeededRandom(1));
 * ae.encode(Float64Array.from([0.5, NaN, -1])).length; // => 2
 */
export class Autoencoder {
  readonly shape: AutoencoderShape;
  readonly layers: readonly DenseLayer[];

  private constructor(shape: AutoencoderShape, params: readonly { weights: Float64Array; bias: Float64Array }[]) {
    this.shape = { d: shape.d, hidden: [...shape.hidden], latent: shape.latent, activation: shape.activation };
    const sizes = layerSizes(shape);
    const latentLayer = shape.hidden.length;
    const last = sizes.length - 2;
    this.layers = params.map((p, l) => ({
      inSize: sizes[l] ?? 0,
      outSize: sizes[l + 1] ?? 0,
      weights: p.weights,
      bias: p.bias,
      activation: l === latentLayer || l === last ? 'identity' : shape.activation,
      hiddenLayer: l !== latentLayer && l !== last,
    }));
  }

  /**
   * Fresh weights: Glorot uniform U(-sqrt(6 / (in + out)), +) for tanh and identity (Glorot and
   * Bengio 2010), He uniform U(-sqrt(6 / in), +) for ReLU (He et al. 2015); biases 0.
   */
  static initialise(shape: AutoencoderShape, rng: Rng): Autoencoder {
    const problem = shapeProblem(shape);
    if (problem) throw new UsageError(`autoencoder: ${problem}`);
    const sizes = layerSizes(shape);
    const params: { weights: Float64Array; bias: Float64Array }[] = [];
    for (let l = 0; l + 1 < sizes.length; l++) {
      const inSize = sizes[l] ?? 0;
      const outSize = sizes[l + 1] ?? 0;
      const limit = shape.activation === 'relu' ? Math.sqrt(6 / inSize) : Math.sqrt(6 / (inSize + outSize));
      const weights = new Float64Array(inSize * outSize);
      for (let i = 0; i < weights.length; i++) weights[i] = (2 * rng.next() - 1) * limit;
      params.push({ weights, bias: new Float64Array(outSize) });
    }
    return new Autoencoder(shape, params);
  }

  get d(): number {
    return this.shape.d;
  }

  get latent(): number {
    return this.shape.latent;
  }

  /** Index of the layer whose output is the code (the encoder is layers 0..latentLayer). */
  get latentLayer(): number {
    return this.shape.hidden.length;
  }

  /** The code of one profile (length d, NaN fed as 0). */
  encode(x: Float64Array): Float64Array {
    this.checkLength(x, this.d, 'encode');
    const input = new Float64Array(this.d);
    for (let j = 0; j < this.d; j++) {
      const v = x[j] ?? NaN;
      input[j] = Number.isNaN(v) ? 0 : v;
    }
    return this.run(input, 0, this.latentLayer + 1);
  }

  /** The profile (length d) a code (length latent) decodes to. */
  decode(code: Float64Array): Float64Array {
    this.checkLength(code, this.latent, 'decode');
    return this.run(code, this.latentLayer + 1, this.layers.length);
  }

  /** decode(encode(x)). */
  reconstruct(x: Float64Array): Float64Array {
    return this.decode(this.encode(x));
  }

  /** A deep copy (same weights, separate arrays). */
  clone(): Autoencoder {
    return new Autoencoder(
      this.shape,
      this.layers.map((l) => ({ weights: l.weights.slice(), bias: l.bias.slice() })),
    );
  }

  /** Overwrites this model's weights with another's of the same shape. */
  copyWeightsFrom(other: Autoencoder): void {
    this.layers.forEach((l, i) => {
      const o = other.layers[i];
      if (!o || o.weights.length !== l.weights.length) throw new UsageError('autoencoder: copyWeightsFrom a different shape');
      l.weights.set(o.weights);
      l.bias.set(o.bias);
    });
  }

  toJSON(): AutoencoderJson {
    return {
      format: AUTOENCODER_FORMAT,
      version: AUTOENCODER_VERSION,
      d: this.shape.d,
      hidden: [...this.shape.hidden],
      latent: this.shape.latent,
      activation: this.shape.activation,
      layers: this.layers.map((l) => ({
        inSize: l.inSize,
        outSize: l.outSize,
        weights: Array.from(l.weights),
        bias: Array.from(l.bias),
      })),
    };
  }

  /**
   * Rebuilds a model from `toJSON()` output. Refuses a wrong format tag or any shape mismatch
   * with StoreError `kindred.store.corrupt`, another version with `kindred.store.version`.
   */
  static fromJSON(json: unknown): Autoencoder {
    const parsed = jsonSchema.safeParse(json);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const where = issue ? issue.path.join('.') || '(root)' : '(root)';
      throw new StoreError('kindred.store.corrupt', `autoencoder JSON: ${where}: ${issue?.message ?? 'invalid'} (expected a ${AUTOENCODER_FORMAT} model)`, { path: where });
    }
    const j = parsed.data;
    if (j.version !== AUTOENCODER_VERSION) {
      throw new StoreError('kindred.store.version', `autoencoder JSON: version ${j.version} (expected ${AUTOENCODER_VERSION})`, { version: j.version });
    }
    const shape: AutoencoderShape = { d: j.d, hidden: j.hidden, latent: j.latent, activation: j.activation };
    const problem = shapeProblem(shape);
    if (problem) throw new StoreError('kindred.store.corrupt', `autoencoder JSON: ${problem}`);
    const sizes = layerSizes(shape);
    if (j.layers.length !== sizes.length - 1) {
      throw new StoreError('kindred.store.corrupt', `autoencoder JSON: ${j.layers.length} layers (expected ${sizes.length - 1} for sizes ${sizes.join('-')})`);
    }
    const params = j.layers.map((l, i) => {
      const inSize = sizes[i] ?? 0;
      const outSize = sizes[i + 1] ?? 0;
      if (l.inSize !== inSize || l.outSize !== outSize || l.weights.length !== inSize * outSize || l.bias.length !== outSize) {
        throw new StoreError(
          'kindred.store.corrupt',
          `autoencoder JSON: layers.${i}: ${l.inSize}x${l.outSize} with ${l.weights.length} weights and ${l.bias.length} biases (expected ${inSize}x${outSize}, ${inSize * outSize} weights, ${outSize} biases)`,
          { layer: i },
        );
      }
      return { weights: Float64Array.from(l.weights), bias: Float64Array.from(l.bias) };
    });
    return new Autoencoder(shape, params);
  }

  private checkLength(v: Float64Array, expected: number, what: string): void {
    if (v.length !== expected) throw new UsageError(`autoencoder.${what}: vector of length ${v.length} (expected ${expected})`);
  }

  private run(input: Float64Array, from: number, to: number): Float64Array {
    let a = input;
    for (let l = from; l < to; l++) {
      const layer = this.layers[l];
      if (!layer) break;
      const out = layer.bias.slice();
      for (let k = 0; k < layer.inSize; k++) {
        const ak = a[k] ?? 0;
        const row = k * layer.outSize;
        for (let j = 0; j < layer.outSize; j++) out[j] = (out[j] ?? 0) + ak * (layer.weights[row + j] ?? 0);
      }
      activateInPlace(layer.activation, out, 0, out.length);
      a = out;
    }
    return a;
  }
}
