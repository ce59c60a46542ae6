import { attributeDistance, type DistanceAttribution } from '../embed/attributeDistance.ts';
import type { Encoder } from '../embed/embeddedDistanceGame.ts';

/** Exact Shapley values up to this many dimensions in play (2^12 = 4,096 encodings a comp). */
export const EXACT_ATTRIBUTION_UP_TO = 12;
/**
 * Permutations walked beyond that (antithetic pairs, so 128 independent units). Measured on the
 * simulated leagues (bench/embedQuality.bench.ts): the standard error of one dimension's value is
 * then a few percent of the comp's distance; it is reported per comp as `attribution_error`.
 */
export const ATTRIBUTION_SAMPLES = 256;

/**
 * The Shapley attribution of a comp's embedded distance to the input dimensions (the game of
 * src/embed/embeddedDistanceGame.ts: a coalition takes the comp's values, the others keep the
 * target's; the empty coalition is worth 0, the full one the embedded distance with every dimension
 * that either side lacks left at the target's value). Exact up to EXACT_ATTRIBUTION_UP_TO dimensions in
 * play, else ATTRIBUTION_SAMPLES antithetic permutations seeded by `seed` (the comp's row, so a
 * query's answer is reproducible); `effort` overrides both. The values add up to `total` either way (efficiency).
 *
 * @example
 * attributeEmbedded((x) => x, Float64Array.of(0, 0), Float64Array.of(3, 4), 1).total; // => 5
 */
export function attributeEmbedded(
  encode: Encoder,
  targetZ: Float64Array,
  compZ: Float64Array,
  seed: number,
  effort: { readonly exactUpTo: number; readonly samples: number } = { exactUpTo: EXACT_ATTRIBUTION_UP_TO, samples: ATTRIBUTION_SAMPLES },
): DistanceAttribution {
  return attributeDistance(encode, targetZ, compZ, { exactUpTo: effort.exactUpTo, samples: effort.samples, seed });
}

/**
 * The lighter effort of the build's pool-level summary (attributionDrivers), which attributes about a
 * thousand comps per group: exact up to 10 dimensions (1,024 encodings), else 128 permutations. A
 * summary of spreads tolerates the larger sampling error (about 1.4 times that of a query's).
 */
export const DRIVER_ATTRIBUTION_EFFORT = { exactUpTo: 10, samples: 128 } as const;
