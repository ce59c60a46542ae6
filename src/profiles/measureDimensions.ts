import type { Dimension, LeagueContext } from './Dimension.ts';
import { regressToMean } from '../stats/regressToMean.ts';
import { regressAverageToMean } from '../stats/regressAverageToMean.ts';
import { DEFAULT_SHRINKAGE, shrinkageFor, type RateSample, type ShrinkageOptions, type ShrinkageUsed } from './shrinkage.ts';

/** Observed and regressed values of one dimension for every line (NaN = missing). */
export interface MeasuredColumn {
  readonly raw: Float64Array;
  readonly regressed: Float64Array;
  /** League stratum key to the k used there (empty for dimensions that are not regressed or derived). */
  readonly shrinkage: ReadonlyMap<string, ShrinkageUsed>;
}

export interface MeasureInput<L> {
  readonly lines: readonly L[];
  /** League stratum of a line for a dimension of the given scope (season and level, plus position). */
  readonly leagueKey: (index: number, scope: 'group' | 'position') => string;
  /** League figures (FIP constant) for a line. */
  readonly league: (index: number) => LeagueContext;
  /**
   * Era of a line for fitting k: lines whose `key` matches (level, plus position for fielding) and whose
   * seasons lie within `eraSeasons` of a stratum's are pooled into its fit. Without it each league
   * stratum is its own era.
   */
  readonly eraOf?: (index: number, scope: 'group' | 'position') => { readonly key: string; readonly season: number };
  /** Fitted or fixed k (default DEFAULT_SHRINKAGE). */
  readonly shrinkage?: ShrinkageOptions;
}

const usable = (x: number | undefined): x is number => x !== undefined && Number.isFinite(x);

/**
 * Measures every dimension on every line. League means are computed over all lines passed in (all
 * position groups of the same kind, so a catcher's OBP is regressed toward the whole league's), per
 * season and level, or per season, level and position for fielding dimensions.
 * Rates: regressToMean(numerator, denominator, league rate, k); a zero or missing denominator is missing;
 * k is fitted per league stratum for binomial rates (see shrinkageFor), else the table's.
 * Means: regressAverageToMean(value, events, league mean, k) with the table's k; without an event count
 * the value is kept as is.
 * Derived dimensions are computed after the others, from their regressed values.
 */
export function measureDimensions<L>(dims: readonly Dimension<L>[], input: MeasureInput<L>): Map<string, MeasuredColumn> {
  const n = input.lines.length;
  const options = input.shrinkage ?? DEFAULT_SHRINKAGE;
  const out = new Map<string, MeasuredColumn>();
  // each line's league stratum key per scope, made once (not once per dimension and pass)
  const keysByScope = new Map<'group' | 'position', readonly string[]>();
  const keysOf = (scope: 'group' | 'position'): readonly string[] => {
    let keys = keysByScope.get(scope);
    if (!keys) keysByScope.set(scope, (keys = Array.from({ length: n }, (_, i) => input.leagueKey(i, scope))));
    return keys;
  };
  for (const dim of dims) {
    const raw = new Float64Array(n).fill(NaN);
    const regressed = new Float64Array(n).fill(NaN);
    const m = dim.measure;
    const shrinkage = new Map<string, ShrinkageUsed>();
    const keys = m.kind === 'derived' ? [] : keysOf(dim.scope);
    if (m.kind === 'rate') {
      const num = new Float64Array(n).fill(NaN);
      const den = new Float64Array(n).fill(NaN);
      const totals = new Map<string, [number, number]>();
      const members = new Map<string, number[]>();
      for (let i = 0; i < n; i++) {
        const line = input.lines[i] as L;
        const a = m.numerator(line);
        const b = m.denominator(line);
        if (!usable(a) || !usable(b) || b <= 0) continue;
        num[i] = a;
        den[i] = b;
        const key = keys[i] as string;
        const t = totals.get(key);
        if (t) {
          t[0] += a;
          t[1] += b;
          (members.get(key) as number[]).push(i);
        } else {
          totals.set(key, [a, b]);
          members.set(key, [i]);
        }
      }
      if (m.stabilisation > 0) {
        // each stratum's sample, made once (a stratum is in the era of each of its neighbours)
        const samples = new Map<readonly number[], RateSample>();
        const sample = (rows: readonly number[]): RateSample => {
          let s = samples.get(rows);
          if (!s) samples.set(rows, (s = { successes: rows.map((i) => num[i] as number), trials: rows.map((i) => den[i] as number) }));
          return s;
        };
        const eras = new Map<string, { season: number; rows: readonly number[] }[]>();
        const eraOfKey = new Map<string, { key: string; season: number }>();
        for (const [key, rows] of members) {
          const era = input.eraOf ? input.eraOf(rows[0] as number, dim.scope) : { key, season: 0 };
          eraOfKey.set(key, era);
          const list = eras.get(era.key);
          if (list) list.push({ season: era.season, rows });
          else eras.set(era.key, [{ season: era.season, rows }]);
        }
        for (const [key, rows] of members) {
          const era = eraOfKey.get(key) as { key: string; season: number };
          const near = (eras.get(era.key) ?? []).filter((e) => Math.abs(e.season - era.season) <= options.eraSeasons);
          const t = totals.get(key) as [number, number];
          shrinkage.set(key, shrinkageFor(near.map((e) => sample(e.rows)), t[0] / t[1], m.stabilisation, m.binomial, options));
        }
      }
      for (let i = 0; i < n; i++) {
        const a = num[i] as number;
        const b = den[i] as number;
        if (Number.isNaN(a)) continue;
        const key = keys[i] as string;
        const t = totals.get(key) as [number, number];
        raw[i] = a / b;
        const used = shrinkage.get(key);
        regressed[i] = used ? regressToMean(a, b, t[0] / t[1], used.k) : a / b;
      }
    } else if (m.kind === 'mean') {
      const vals = new Float64Array(n).fill(NaN);
      const evs = new Float64Array(n).fill(NaN);
      const totals = new Map<string, [number, number]>();
      for (let i = 0; i < n; i++) {
        const line = input.lines[i] as L;
        const v = m.value(line);
        if (!usable(v)) continue;
        vals[i] = v;
        const e = m.events(line);
        if (!usable(e) || e <= 0) continue;
        evs[i] = e;
        const key = keys[i] as string;
        const t = totals.get(key);
        if (t) {
          t[0] += v * e;
          t[1] += e;
        } else totals.set(key, [v * e, e]);
      }
      for (let i = 0; i < n; i++) {
        const v = vals[i] as number;
        if (Number.isNaN(v)) continue;
        raw[i] = v;
        const e = evs[i] as number;
        const key = keys[i] as string;
        const t = totals.get(key);
        const k = m.stabilisation * options.tableScale;
        if (m.stabilisation > 0 && t && !shrinkage.has(key)) shrinkage.set(key, { k, table: k, source: 'table', players: 0 });
        regressed[i] = m.stabilisation > 0 && !Number.isNaN(e) && t ? regressAverageToMean(v, e, t[0] / t[1], k) : v;
      }
    }
    out.set(dim.name, { raw, regressed, shrinkage });
  }
  for (const dim of dims) {
    const m = dim.measure;
    if (m.kind !== 'derived') continue;
    const raw = new Float64Array(n).fill(NaN);
    const regressed = new Float64Array(n).fill(NaN);
    const others = [...out.entries()];
    // one map refilled for each line (a derived measure reads it during its call only)
    const values = new Map<string, number>();
    for (let i = 0; i < n; i++) {
      const line = input.lines[i] as L;
      const league = input.league(i);
      const r = m.raw(line, league);
      if (usable(r)) raw[i] = r;
      values.clear();
      for (const [name, col] of others) {
        const v = col.regressed[i] as number;
        if (!Number.isNaN(v)) values.set(name, v);
      }
      const g = m.regressed(line, values, league);
      if (usable(g)) regressed[i] = g;
    }
    out.set(dim.name, { raw, regressed, shrinkage: new Map() });
  }
  return out;
}
