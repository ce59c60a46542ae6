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
  // each line's league stratum per scope, made once (not once per dimension and pass): its key, and a
  // number per stratum (in the order of first appearance) that the passes below index arrays by
  const strataByScope = new Map<'group' | 'position', LineStrata>();
  const strataOf = (scope: 'group' | 'position'): LineStrata => {
    let strata = strataByScope.get(scope);
    if (!strata) strataByScope.set(scope, (strata = lineStrata(n, (i) => input.leagueKey(i, scope))));
    return strata;
  };
  for (const dim of dims) {
    const raw = new Float64Array(n).fill(NaN);
    const regressed = new Float64Array(n).fill(NaN);
    const m = dim.measure;
    const shrinkage = new Map<string, ShrinkageUsed>();
    if (m.kind === 'derived') {
      out.set(dim.name, { raw, regressed, shrinkage });
      continue;
    }
    const { of: stratumOf, keys } = strataOf(dim.scope);
    const count = keys.length;
    // per stratum: whether a line has added to it yet, and its totals (each started by its first line's
    // values and added to in line order, as a running sum over the lines)
    const seen = new Uint8Array(count);
    const sumA = new Float64Array(count);
    const sumB = new Float64Array(count);
    /** The strata in the order their first contributing line comes (the order `shrinkage` lists them). */
    const order: number[] = [];
    if (m.kind === 'rate') {
      const num = new Float64Array(n).fill(NaN);
      const den = new Float64Array(n).fill(NaN);
      for (let i = 0; i < n; i++) {
        const line = input.lines[i] as L;
        const a = m.numerator(line);
        const b = m.denominator(line);
        if (!usable(a) || !usable(b) || b <= 0) continue;
        num[i] = a;
        den[i] = b;
        const st = stratumOf[i] as number;
        if (seen[st] === 1) {
          sumA[st] = (sumA[st] as number) + a;
          sumB[st] = (sumB[st] as number) + b;
        } else {
          seen[st] = 1;
          sumA[st] = a;
          sumB[st] = b;
          order.push(st);
        }
      }
      if (m.stabilisation > 0) {
        if (options.fit && m.binomial) {
          fitShrinkage(shrinkage, { n, num, stratumOf, keys, order, sumA, sumB, den }, m.stabilisation, dim.scope, input, options);
        } else {
          // shrinkageFor gives the table's k without looking at the samples when it does not fit
          for (const st of order) shrinkage.set(keys[st] as string, shrinkageFor([], (sumA[st] as number) / (sumB[st] as number), m.stabilisation, m.binomial, options));
        }
      }
      // each stratum's k, when it has one
      const kOf = new Float64Array(count);
      const hasK = new Uint8Array(count);
      for (const st of order) {
        const used = shrinkage.get(keys[st] as string);
        if (used) {
          kOf[st] = used.k;
          hasK[st] = 1;
        }
      }
      for (let i = 0; i < n; i++) {
        const a = num[i] as number;
        const b = den[i] as number;
        if (Number.isNaN(a)) continue;
        const st = stratumOf[i] as number;
        raw[i] = a / b;
        regressed[i] = hasK[st] === 1 ? regressToMean(a, b, (sumA[st] as number) / (sumB[st] as number), kOf[st] as number) : a / b;
      }
    } else if (m.kind === 'mean') {
      const vals = new Float64Array(n).fill(NaN);
      const evs = new Float64Array(n).fill(NaN);
      for (let i = 0; i < n; i++) {
        const line = input.lines[i] as L;
        const v = m.value(line);
        if (!usable(v)) continue;
        vals[i] = v;
        const e = m.events(line);
        if (!usable(e) || e <= 0) continue;
        evs[i] = e;
        const st = stratumOf[i] as number;
        if (seen[st] === 1) {
          sumA[st] = (sumA[st] as number) + v * e;
          sumB[st] = (sumB[st] as number) + e;
        } else {
          seen[st] = 1;
          sumA[st] = v * e;
          sumB[st] = e;
        }
      }
      const k = m.stabilisation * options.tableScale;
      for (let i = 0; i < n; i++) {
        const v = vals[i] as number;
        if (Number.isNaN(v)) continue;
        raw[i] = v;
        const e = evs[i] as number;
        const st = stratumOf[i] as number;
        const has = seen[st] === 1;
        if (m.stabilisation > 0 && has) {
          const key = keys[st] as string;
          if (!shrinkage.has(key)) shrinkage.set(key, { k, table: k, source: 'table', players: 0 });
        }
        regressed[i] = m.stabilisation > 0 && !Number.isNaN(e) && has ? regressAverageToMean(v, e, (sumA[st] as number) / (sumB[st] as number), k) : v;
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

/** Each line's league stratum as a number, and each number's key (numbered in order of first appearance). */
interface LineStrata {
  readonly of: Int32Array;
  readonly keys: readonly string[];
}

function lineStrata(n: number, keyOf: (i: number) => string): LineStrata {
  const of = new Int32Array(n);
  const ids = new Map<string, number>();
  const keys: string[] = [];
  for (let i = 0; i < n; i++) {
    const key = keyOf(i);
    let id = ids.get(key);
    if (id === undefined) {
      id = keys.length;
      ids.set(key, id);
      keys.push(key);
    }
    of[i] = id;
  }
  return { of, keys };
}

/**
 * Fits k per league stratum of a binomial rate (shrinkageFor) over the stratum's era: the strata of the
 * same era key (level, plus position for fielding) within `eraSeasons` seasons, each a sample of its own
 * lines (successes and trials in line order).
 */
function fitShrinkage<L>(
  shrinkage: Map<string, ShrinkageUsed>,
  lines: {
    readonly n: number;
    readonly num: Float64Array;
    readonly den: Float64Array;
    readonly stratumOf: Int32Array;
    readonly keys: readonly string[];
    readonly order: readonly number[];
    readonly sumA: Float64Array;
    readonly sumB: Float64Array;
  },
  stabilisation: number,
  scope: 'group' | 'position',
  input: MeasureInput<L>,
  options: ShrinkageOptions,
): void {
  const members = new Map<number, number[]>(lines.order.map((st) => [st, []]));
  for (let i = 0; i < lines.n; i++) if (!Number.isNaN(lines.num[i] as number)) members.get(lines.stratumOf[i] as number)?.push(i);
  const samples = new Map<number, RateSample>();
  const sample = (st: number, rows: readonly number[]): RateSample => {
    let s = samples.get(st);
    if (!s) samples.set(st, (s = { successes: rows.map((i) => lines.num[i] as number), trials: rows.map((i) => lines.den[i] as number) }));
    return s;
  };
  const eras = new Map<string, { st: number; season: number; rows: readonly number[] }[]>();
  const eraOfStratum = new Map<number, { key: string; season: number }>();
  for (const [st, rows] of members) {
    const key = lines.keys[st] as string;
    const era = input.eraOf ? input.eraOf(rows[0] as number, scope) : { key, season: 0 };
    eraOfStratum.set(st, era);
    const list = eras.get(era.key);
    if (list) list.push({ st, season: era.season, rows });
    else eras.set(era.key, [{ st, season: era.season, rows }]);
  }
  for (const st of members.keys()) {
    const era = eraOfStratum.get(st) as { key: string; season: number };
    const near = (eras.get(era.key) ?? []).filter((e) => Math.abs(e.season - era.season) <= options.eraSeasons);
    const rate = (lines.sumA[st] as number) / (lines.sumB[st] as number);
    shrinkage.set(lines.keys[st] as string, shrinkageFor(near.map((e) => sample(e.st, e.rows)), rate, stabilisation, true, options));
  }
}
