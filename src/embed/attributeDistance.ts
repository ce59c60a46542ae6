import { UsageError } from '../errors/KindredError.ts';
import { embeddedDistanceGame, type Encoder } from './embeddedDistanceGame.ts';
import { exactShapley, MAX_EXACT_PLAYERS, permutationShapley } from './shapley.ts';

export interface AttributeOptions {
  /** Exact Shapley values when at most this many dimensions are in play (default 12: 4096 encodings). */
  readonly exactUpTo?: number;
  /** Permutations for the sampled estimate (default 1000, antithetic pairs). */
  readonly samples?: number;
  /** Seed of the sampled estimate (default 1). */
  readonly seed?: number;
}

export interface DistanceAttribution {
  /** Per dimension (length d): its part of the embedded distance; 0 for dummies. */
  readonly values: Float64Array;
  /** Per dimension: standard error of the sampled estimate (all 0 when exact). */
  readonly standardError: Float64Array;
  /** v(all): the embedded distance the values add up to. */
  readonly total: number;
  readonly method: 'exact' | 'sampled';
  /** Dimensions in play: present on both sides and different. */
  readonly players: number;
}

/**
 * Shapley attribution of the embedded distance between a target and a comp (see
 * `embeddedDistanceGame`). Dummy dimensions (missing on either side, or equal) are set aside first,
 * which leaves the others' Shapley values unchanged (the null-player property, Shapley 1953); the
 * remaining m dimensions are solved exactly when m <= exactUpTo, else by antithetic permutation
 * sampling. Either way the values sum to `total` (efficiency).
 *
 * @example
 * const r = attributeDistance((x) => x, Float64Array.of(0, 0, 1), Float64Array.of(3, 4, 1));
 * r.total; // => 5; r.values[2] === 0 (equal dimension)
 */
export function attributeDistance(encode: Encoder, target: Float64Array, comp: Float64Array, options: AttributeOptions = {}): DistanceAttribution {
  const exactUpTo = options.exactUpTo ?? 12;
  const samples = options.samples ?? 1000;
  const seed = options.seed ?? 1;
  if (!(Number.isInteger(exactUpTo) && exactUpTo >= 0 && exactUpTo <= MAX_EXACT_PLAYERS)) {
    throw new UsageError(`attributeDistance: exactUpTo ${exactUpTo} (expected an integer from 0 to ${MAX_EXACT_PLAYERS})`);
  }
  const game = embeddedDistanceGame(encode, target, comp);
  const d = target.length;
  const active: number[] = [];
  for (let j = 0; j < d; j++) {
    const t = target[j] ?? NaN;
    const c = comp[j] ?? NaN;
    if (!Number.isNaN(t) && !Number.isNaN(c) && t !== c) active.push(j);
  }
  const full = new Uint8Array(d).fill(1);
  const total = game(full);
  const values = new Float64Array(d);
  const standardError = new Float64Array(d);
  const m = active.length;
  if (m === 0) return { values, standardError, total, method: 'exact', players: 0 };

  const coalition = new Uint8Array(d);
  const reduced = (sub: Uint8Array): number => {
    coalition.fill(0);
    for (let p = 0; p < m; p++) if (sub[p]) coalition[active[p] ?? 0] = 1;
    return game(coalition);
  };
  if (m <= exactUpTo) {
    const phi = exactShapley(m, reduced);
    active.forEach((j, p) => (values[j] = phi[p] ?? 0));
    return { values, standardError, total, method: 'exact', players: m };
  }
  const estimate = permutationShapley(m, reduced, { samples, seed });
  active.forEach((j, p) => {
    values[j] = estimate.values[p] ?? 0;
    standardError[j] = estimate.standardError[p] ?? 0;
  });
  return { values, standardError, total, method: 'sampled', players: m };
}
