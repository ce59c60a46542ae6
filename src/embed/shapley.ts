import { UsageError } from '../errors/KindredError.ts';
import { SeededRandom } from '../random/SeededRandom.ts';
import { shuffleInPlace } from '../random/shuffleInPlace.ts';

/** A cooperative game's characteristic function: coalition[i] = 1 when player i is in. Must not keep the array. */
export type CoalitionValue = (coalition: Uint8Array) => number;

/** Largest n accepted by `exactShapley` (2^20 evaluations); up to 16 runs in well under a second for cheap games. */
export const MAX_EXACT_PLAYERS = 20;
/** Largest n for which `permutationShapley` memoises coalition values (keys are 30-bit masks). */
const MAX_MEMO_PLAYERS = 30;
const MAX_MEMO_ENTRIES = 1 << 20;

function checkPlayers(n: number, max: number, what: string): void {
  if (!(Number.isInteger(n) && n >= 1 && n <= max)) throw new UsageError(`${what}: n ${n} (expected an integer from 1 to ${max})`);
}

/**
 * Exact Shapley values (Shapley 1953, "A value for n-person games", Contributions to the Theory of Games II):
 * phi_i = sum over S not containing i of |S|! (n - |S| - 1)! / n! * (v(S + i) - v(S)).
 * Every one of the 2^n coalitions is evaluated once (memoised in a table indexed by bit mask),
 * then the sums cost n * 2^(n-1). Efficiency holds: sum phi = v(all) - v(empty).
 *
 * @example
 * // glove game: player 0 holds a left glove, players 1 and 2 a right glove each
 * exactShapley(3, (c) => (c[0] && (c[1] || c[2]) ? 1 : 0)); // => [2/3, 1/6, 1/6]
 */
export function exactShapley(n: number, value: CoalitionValue): Float64Array {
  checkPlayers(n, MAX_EXACT_PLAYERS, 'exactShapley');
  const size = 1 << n;
  const v = new Float64Array(size);
  const size_ = new Uint8Array(size);
  const coalition = new Uint8Array(n);
  for (let mask = 0; mask < size; mask++) {
    let count = 0;
    for (let i = 0; i < n; i++) {
      const inside = mask & (1 << i) ? 1 : 0;
      coalition[i] = inside;
      count += inside;
    }
    size_[mask] = count;
    v[mask] = value(coalition);
  }
  // weight(s) = s! (n - s - 1)! / n! = 1 / (n * C(n - 1, s))
  const weight = new Float64Array(n);
  let binom = 1;
  for (let s = 0; s < n; s++) {
    weight[s] = 1 / (n * binom);
    binom = (binom * (n - 1 - s)) / (s + 1);
  }
  const phi = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const bit = 1 << i;
    let sum = 0;
    for (let mask = 0; mask < size; mask++) {
      if (mask & bit) continue;
      sum += (weight[size_[mask] ?? 0] ?? 0) * ((v[mask | bit] ?? 0) - (v[mask] ?? 0));
    }
    phi[i] = sum;
  }
  return phi;
}

export interface PermutationShapleyOptions {
  /** Permutations to walk (at least 2). */
  readonly samples: number;
  readonly seed: number;
  /** Pair every permutation with its reverse (default true). */
  readonly antithetic?: boolean;
}

export interface ShapleyEstimate {
  readonly values: Float64Array;
  /** Standard error of each value: s / sqrt(m) over the m independent units (see permutationShapley). */
  readonly standardError: Float64Array;
}

/**
 * Monte Carlo Shapley values by permutation sampling (Castro, Gomez and Tejada 2009, "Polynomial
 * calculation of the Shapley value based on sampling", Computers & Operations Research 36): walk a
 * uniformly random order of the players, credit each with v(before + i) - v(before); average.
 * With `antithetic` (default) each order is paired with its reverse and the pair's mean is one unit
 * (antithetic variates; permutation version as in Mitchell et al. 2022, JMLR, from memory), so
 * m = floor(samples / 2) units; otherwise m = samples.
 * Stated error: standardError_i = s_i / sqrt(m), s_i the sample standard deviation (m - 1) of the
 * unit means; the estimate is unbiased and about normal, so |estimate - exact| < 3 standard errors
 * for each player with probability about 0.997. Every order's credits sum to v(all) - v(empty), so
 * the estimates satisfy efficiency exactly (up to rounding). Coalition values are memoised by mask
 * (n <= 30). Cost: at most samples * n evaluations.
 *
 * @example
 * permutationShapley(3, (c) => (c[0] && (c[1] || c[2]) ? 1 : 0), { samples: 2000, seed: 1 }).values; // ~ [0.667, 0.167, 0.167]
 */
export function permutationShapley(n: number, value: CoalitionValue, options: PermutationShapleyOptions): ShapleyEstimate {
  checkPlayers(n, 1 << 16, 'permutationShapley');
  const { samples, seed } = options;
  const antithetic = options.antithetic ?? true;
  const units = antithetic ? Math.floor(samples / 2) : samples;
  if (!(Number.isInteger(samples) && units >= 2)) {
    throw new UsageError(`permutationShapley: samples ${samples} (expected an integer >= ${antithetic ? 4 : 2})`);
  }
  const memo = n <= MAX_MEMO_PLAYERS ? new Map<number, number>() : null;
  const coalition = new Uint8Array(n);
  const evaluate = (mask: number): number => {
    if (memo) {
      const hit = memo.get(mask);
      if (hit !== undefined) return hit;
    }
    const result = value(coalition);
    if (memo && memo.size < MAX_MEMO_ENTRIES) memo.set(mask, result);
    return result;
  };
  const walk = (order: Int32Array, credit: Float64Array, reverse: boolean): void => {
    coalition.fill(0);
    let mask = 0;
    let previous = evaluate(0);
    for (let p = 0; p < n; p++) {
      const i = order[reverse ? n - 1 - p : p] ?? 0;
      coalition[i] = 1;
      if (memo) mask |= 1 << i;
      const current = evaluate(mask);
      credit[i] = (credit[i] ?? 0) + current - previous;
      previous = current;
    }
  };

  const rng = new SeededRandom(seed);
  const order = Int32Array.from({ length: n }, (_, i) => i);
  const sum = new Float64Array(n);
  const sumSq = new Float64Array(n);
  const unit = new Float64Array(n);
  for (let u = 0; u < units; u++) {
    shuffleInPlace(order, rng);
    unit.fill(0);
    walk(order, unit, false);
    if (antithetic) {
      walk(order, unit, true);
      for (let i = 0; i < n; i++) unit[i] = (unit[i] ?? 0) / 2;
    }
    for (let i = 0; i < n; i++) {
      const x = unit[i] ?? 0;
      sum[i] = (sum[i] ?? 0) + x;
      sumSq[i] = (sumSq[i] ?? 0) + x * x;
    }
  }
  const values = new Float64Array(n);
  const standardError = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const mean = (sum[i] ?? 0) / units;
    const variance = Math.max(0, ((sumSq[i] ?? 0) - units * mean * mean) / (units - 1));
    values[i] = mean;
    standardError[i] = Math.sqrt(variance / units);
  }
  return { values, standardError };
}
