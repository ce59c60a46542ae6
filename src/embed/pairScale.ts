import { UsageError } from '../errors/KindredError.ts';
import { SeededRandom } from '../random/SeededRandom.ts';

/**
 * The scale s of embedded likeness: half the mean squared Euclidean distance between the codes of
 * random pairs of distinct rows (a project choice, mirroring the input space, where two unrelated
 * standardised profiles differ by about 2W in weighted squared distance and W is the likeness scale).
 * With it, 100 * exp(-d^2 / (2 s)) gives 100 for identical codes and about 100 / e = 37 for a typical
 * unrelated pair. Pairs are drawn with a seeded generator (`pairs` of them, with replacement, i != j),
 * so the value is reproducible. Cost O(pairs * k).
 *
 * @example
 * // two rows, codes [0, 0] and [3, 4]: every pair is at squared distance 25, so s = 12.5
 * pairScale(Float64Array.of(0, 0, 3, 4), 2, 2, 100, 1); // => 12.5
 */
export function pairScale(codes: Float64Array, n: number, k: number, pairs: number, seed: number): number {
  if (!(Number.isInteger(n) && n >= 2)) throw new UsageError(`pairScale: n ${n} (expected at least 2 rows)`);
  if (!(Number.isInteger(k) && k >= 1) || codes.length !== n * k) {
    throw new UsageError(`pairScale: ${codes.length} values for n ${n}, k ${k} (expected n * k)`);
  }
  if (!(Number.isInteger(pairs) && pairs >= 1)) throw new UsageError(`pairScale: pairs ${pairs} (expected a positive integer)`);
  const rng = new SeededRandom(seed);
  let sum = 0;
  for (let p = 0; p < pairs; p++) {
    const i = rng.int(n);
    let j = rng.int(n - 1);
    if (j >= i) j++;
    let s = 0;
    for (let q = 0; q < k; q++) {
      const e = (codes[i * k + q] ?? 0) - (codes[j * k + q] ?? 0);
      s += e * e;
    }
    sum += s;
  }
  return sum / pairs / 2;
}
