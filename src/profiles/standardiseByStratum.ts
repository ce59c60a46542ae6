import { zScore } from '../stats/zScore.ts';

/** Mean and sample standard deviation of a dimension in one stratum, and where they came from. */
export interface StratumStats {
  readonly mean: number;
  readonly sd: number;
  /** Values the figures rest on (after borrowing). */
  readonly n: number;
  /** Seasons pooled: [first, last]; wider than the season itself when the stratum was thin. */
  readonly seasons: readonly [number, number];
}

export interface StandardiseOptions {
  /** A stratum with fewer values borrows neighbouring seasons (same level and group or position). */
  readonly minStratum: number;
  /** Widest borrowing, in seasons either side. */
  readonly maxBorrow: number;
}

export const DEFAULT_STANDARDISE: StandardiseOptions = { minStratum: 30, maxBorrow: 3 };

export interface StandardisedColumn {
  readonly z: Float64Array;
  /** Key `${season}|${level}|${scope}` to its stats. */
  readonly strata: ReadonlyMap<string, StratumStats>;
}

export const stratumKey = (season: number, level: string, scope: string): string => `${season}|${level}|${scope}`;

/**
 * Standardises a column within strata of season, level and scope (position group or position):
 * z = (x - mean) / sd, the sample standard deviation (n - 1). A stratum with fewer than
 * `minStratum` values pools the seasons either side, one more season each step, up to `maxBorrow`;
 * a stratum still under 2 values leaves its z missing; a zero spread gives z = 0.
 * NaN (missing) values are skipped and stay NaN.
 *
 * @example
 * // one stratum holding 1, 2, 3: mean 2, sd 1, so z = [-1, 0, 1]
 */
export function standardiseByStratum(
  values: Float64Array,
  season: (i: number) => number,
  base: (i: number) => string,
  options: StandardiseOptions = DEFAULT_STANDARDISE,
): StandardisedColumn {
  const n = values.length;
  // base (level|scope) -> season -> [count, sum, sum of squares]
  const acc = new Map<string, Map<number, [number, number, number]>>();
  // each value's base and season, taken once
  const bases: string[] = new Array<string>(n);
  const seasons = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x)) continue;
    const b = base(i);
    bases[i] = b;
    seasons[i] = season(i);
    let bySeason = acc.get(b);
    if (!bySeason) acc.set(b, (bySeason = new Map()));
    const s = seasons[i] as number;
    const t = bySeason.get(s);
    if (t) {
      t[0]++;
      t[1] += x;
      t[2] += x * x;
    } else bySeason.set(s, [1, x, x * x]);
  }
  const strata = new Map<string, StratumStats>();
  /** The same stats by base, then season (looked up without making each value's key). */
  const byBase = new Map<string, Map<number, StratumStats>>();
  for (const [b, bySeason] of acc) {
    const statsBySeason = new Map<number, StratumStats>();
    byBase.set(b, statsBySeason);
    for (const s of bySeason.keys()) {
      let count = 0;
      let sum = 0;
      let sumSq = 0;
      let w = 0;
      for (; w <= options.maxBorrow; w++) {
        count = 0;
        sum = 0;
        sumSq = 0;
        for (let t = s - w; t <= s + w; t++) {
          const a = bySeason.get(t);
          if (!a) continue;
          count += a[0];
          sum += a[1];
          sumSq += a[2];
        }
        if (count >= options.minStratum) break;
      }
      const width = Math.min(w, options.maxBorrow);
      const mean = sum / count;
      const variance = count > 1 ? Math.max(0, (sumSq - count * mean * mean) / (count - 1)) : NaN;
      const [level, ...scope] = b.split('|');
      const stats: StratumStats = { mean, sd: Math.sqrt(variance), n: count, seasons: [s - width, s + width] };
      strata.set(stratumKey(s, level ?? '', scope.join('|')), stats);
      statsBySeason.set(s, stats);
    }
  }
  const z = new Float64Array(n).fill(NaN);
  for (let i = 0; i < n; i++) {
    const x = values[i] as number;
    if (Number.isNaN(x)) continue;
    const st = byBase.get(bases[i] as string)?.get(seasons[i] as number);
    if (!st || Number.isNaN(st.sd)) continue;
    z[i] = st.sd === 0 ? 0 : zScore(x, st.mean, st.sd);
  }
  return { z, strata };
}
