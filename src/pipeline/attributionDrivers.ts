import type { AttributionRow } from '../embed/charts/attributionSpreadSvg.ts';
import { SeededRandom } from '../random/SeededRandom.ts';
import { shuffleInPlace } from '../random/shuffleInPlace.ts';
import type { Encoder } from '../embed/embeddedDistanceGame.ts';
import type { EmbeddingDriver } from '../store/groupEmbeddingFile.ts';
import { quantileSorted } from '../stats/quantile.ts';
import { attributeEmbedded, DRIVER_ATTRIBUTION_EFFORT } from '../query/attributeEmbedded.ts';

export interface DriverInput {
  readonly encode: Encoder;
  /** Standardised profiles, n x d (NaN = missing). */
  readonly z: Float32Array;
  /** Codes, n x dim. */
  readonly codes: Float64Array;
  readonly n: number;
  readonly d: number;
  readonly dim: number;
  /** Player id of each row. */
  readonly players: readonly string[];
  /** Dimension names (length d). */
  readonly names: readonly string[];
}

export interface DriverSummary {
  /** One row per comp and dimension in play, for attributionSpreadSvg. */
  readonly rows: AttributionRow[];
  /** Per dimension (in input order): the spread of its attributions. */
  readonly dims: EmbeddingDriver[];
  readonly targets: number;
  readonly comps: number;
}

/**
 * "What drives comps in this group": `targets` distinct rows drawn with a seeded generator, for each its
 * `comps` nearest rows in the embedded space (Euclidean between codes, other players only, each player
 * at his closest season, the query's own rule), and the Shapley attribution of every such comp
 * (attributeEmbedded, at DRIVER_ATTRIBUTION_EFFORT). Per dimension: mean |attribution|, mean, min, quartiles, max over the comps
 * in which both sides have it. Cost: targets x (n x dim for the scan + comps attributions).
 */
export function attributionDrivers(input: DriverInput, targets: number, comps: number, seed: number): DriverSummary {
  const { n, d, dim, codes, z } = input;
  const order = shuffleInPlace(Int32Array.from({ length: n }, (_, i) => i), new SeededRandom(seed));
  const picked = order.subarray(0, Math.min(targets, n));
  const values: number[][] = Array.from({ length: d }, () => []);
  const rows: AttributionRow[] = [];
  const ids = new Map<string, number>();
  const player = Int32Array.from(input.players, (p) => {
    const known = ids.get(p);
    if (known !== undefined) return known;
    ids.set(p, ids.size);
    return ids.size - 1;
  });
  const bestD2 = new Float64Array(ids.size);
  const bestRow = new Int32Array(ids.size);
  let compsSeen = 0;
  for (const t of picked) {
    const targetZ = Float64Array.from(z.subarray(t * d, (t + 1) * d));
    const targetCode = codes.subarray(t * dim, (t + 1) * dim);
    const own = player[t] ?? -1;
    bestD2.fill(Infinity);
    for (let i = 0; i < n; i++) {
      const p = player[i] ?? 0;
      if (p === own) continue;
      let s = 0;
      for (let q = 0; q < dim; q++) {
        const e = (codes[i * dim + q] ?? 0) - (targetCode[q] ?? 0);
        s += e * e;
      }
      if (s < (bestD2[p] ?? Infinity)) {
        bestD2[p] = s;
        bestRow[p] = i;
      }
    }
    // the `comps` closest players, kept sorted by (d2, row) with insertion
    const nearest: { row: number; d2: number }[] = [];
    const before = (x: { row: number; d2: number }, y: { row: number; d2: number }): boolean => x.d2 < y.d2 || (x.d2 === y.d2 && x.row < y.row);
    for (let p = 0; p < ids.size; p++) {
      const d2 = bestD2[p] ?? Infinity;
      if (p === own || !Number.isFinite(d2)) continue;
      const item = { row: bestRow[p] ?? 0, d2 };
      const last = nearest[nearest.length - 1];
      if (nearest.length >= comps && last && !before(item, last)) continue;
      let at = nearest.length;
      while (at > 0 && before(item, nearest[at - 1] ?? item)) at--;
      nearest.splice(at, 0, item);
      if (nearest.length > comps) nearest.pop();
    }
    for (const c of nearest) {
      const compZ = Float64Array.from(z.subarray(c.row * d, (c.row + 1) * d));
      const a = attributeEmbedded(input.encode, targetZ, compZ, c.row + 1, DRIVER_ATTRIBUTION_EFFORT);
      compsSeen++;
      for (let j = 0; j < d; j++) {
        if (Number.isNaN(targetZ[j] ?? NaN) || Number.isNaN(compZ[j] ?? NaN)) continue;
        const v = a.values[j] ?? 0;
        values[j]?.push(v);
        rows.push({ dimension: input.names[j] ?? `d${j}`, attribution: v });
      }
    }
  }
  const dims: EmbeddingDriver[] = input.names.map((name, j) => {
    const list = values[j] ?? [];
    const sorted = [...list].sort((a, b) => a - b);
    const count = list.length;
    const mean = count > 0 ? list.reduce((s, v) => s + v, 0) / count : 0;
    const meanAbs = count > 0 ? list.reduce((s, v) => s + Math.abs(v), 0) / count : 0;
    const q = (p: number): number => (count > 0 ? quantileSorted(sorted, p) : 0);
    return { name, mean_abs: meanAbs, mean, min: q(0), q1: q(0.25), median: q(0.5), q3: q(0.75), max: q(1), count };
  });
  return { rows, dims, targets: picked.length, comps: compsSeen };
}
