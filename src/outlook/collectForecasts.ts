import { isPitcherGroup, type PositionGroup } from '../profiles/positionGroup.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';
import { playerTarget } from '../query/playerTarget.ts';
import { findProspectComps, type ProspectOptions } from '../jobs/findProspectComps.ts';
import { storeAsOf } from './groupAsOf.ts';
import { OUTLOOK_CONSTANTS } from './outlookConstants.ts';
import { peakOf, type Outcomes } from './Outcomes.ts';
import { peakSummaryOf } from './summariseOutlook.ts';
import type { OutcomeKind } from './CompOutcome.ts';
import type { Outlook } from './Outlook.ts';

/** A distribution's p10, p50, p90 (NaN when it has no values) and how many values it rests on. */
export interface Spread {
  readonly n: number;
  readonly p10: number;
  readonly p50: number;
  readonly p90: number;
}

/** One prospect-season forecast as it could have been made at the end of its own season, and (when known) what followed. */
export interface RawForecast {
  readonly kind: OutcomeKind;
  readonly group: PositionGroup;
  readonly player: number;
  readonly row: number;
  readonly season: number;
  readonly level: number;
  readonly age: number;
  /** PA (hitters) or BF (pitchers) that season. */
  readonly sample: number;
  /** His highest level in his group the season before (-1: no profile that season). */
  readonly levelBefore: number;
  /** Whether he also played at a lower level in his group that season (promoted during it). */
  readonly climbed: boolean;
  /** PA or BF over all his levels in his group that season. */
  readonly seasonSample: number;
  /** His standardised profile that season (as built at the end of it), by dimension name; missing dimensions absent. */
  readonly profile: Readonly<Record<string, number>>;
  readonly comps: {
    readonly used: number;
    readonly effective: number;
    /** Likeness-weighted share who reached the top level (NaN without comps). */
    readonly share: number;
    readonly peak: Spread;
    readonly seasons: Spread;
  };
  /** The base rate of the same pool (level, age, and any band or path of the options). */
  readonly matched: { readonly n: number; readonly share: number; readonly peak: Spread; readonly seasons: Spread };
  /** The plain level-and-age base rate: every earlier complete-window player-season at his level, age +/- 1, in his group. */
  readonly levelAge: { readonly n: number; readonly share: number };
  /** What followed in season + 1 .. season + horizon, or null when the window runs past the data. */
  readonly truth: { readonly reached: boolean; readonly peak: number | null; readonly seasons: number } | null;
}

export interface CollectOptions {
  readonly prospect: ProspectOptions;
  readonly groups?: readonly PositionGroup[];
  /** At most this many targets per season and position group (a fixed pseudo-random choice); default 150. */
  readonly perSeason?: number;
  /** Only seasons in this range (default: every season with earlier complete-window seasons). */
  readonly seasons?: readonly [number, number];
}

const nan = (x: number | null): number => (x === null ? NaN : x);
const spreadOf = (q: { n: number; p10: number | null; p50: number | null; p90: number | null }): Spread => ({
  n: q.n, p10: nan(q.p10), p50: nan(q.p50), p90: nan(q.p90),
});

/**
 * Forecasts every prospect-season (a player's highest level below the top in a season, in his group,
 * with an age) as of the end of that season: findProspectComps with asOf = his season on the group as
 * built then (groupAsOf: standardisation and weights from rows up to his season), so that only what was
 * known then enters (pool seasons before his, comp outcomes whose window had ended). These are
 * the raw material of the rolling-origin backtest (runBacktest): a forecast at season t, with its
 * truth known by t + horizon, may calibrate forecasts at cuts from t + horizon on.
 * Per season and position group at most `perSeason` targets, chosen by Knuth's multiplicative hash of the player.
 */
export function collectForecasts(store: ProfileStore, outcomes: Outcomes, options: CollectOptions): RawForecast[] {
  const horizon = options.prospect.horizon;
  const top = store.levels.indexOf(outcomes.topLevel);
  const perSeason = options.perSeason ?? 150;
  const first = options.seasons?.[0] ?? outcomes.firstSeason + horizon;
  const last = options.seasons?.[1] ?? outcomes.lastSeason;
  const out: RawForecast[] = [];
  for (const [group, g] of store.groups) {
    if (options.groups && !options.groups.includes(group)) continue;
    const kind: OutcomeKind = isPitcherGroup(group) ? 'pitcher' : 'hitter';
    const reachedOf = rowOutcomes(g, outcomes, kind, horizon);
    const bySeason = new Map<number, number[]>();
    const best = new Map<string, number>();
    for (let i = 0; i < g.n; i++) {
      const s = g.season[i] as number;
      if (g.level[i] === top || Number.isNaN(g.age[i] as number) || s < first || s > last) continue;
      const key = `${g.player[i]}|${s}`;
      const b = best.get(key);
      if (b === undefined || (g.level[i] as number) > (g.level[b] as number)) best.set(key, i);
    }
    for (const i of best.values()) {
      const s = g.season[i] as number;
      const list = bySeason.get(s);
      if (list) list.push(i);
      else bySeason.set(s, [i]);
    }
    for (const [season, rows] of [...bySeason].sort((a, b) => a[0] - b[0])) {
      // the group as built at the end of the season: later rows, and their say in standardisation and weights, left out
      const view = storeAsOf(store, group, season);
      const hash = (r: number): number => (((g.player[r] as number) + 1) * 2654435761 + season * 40503) % 4294967296;
      const chosen = rows.length > perSeason ? [...rows].sort((a, b) => hash(a) - hash(b)).slice(0, perSeason) : rows;
      const vg = view.groups.get(group) ?? g;
      // a profile that could not be standardised then (a stratum still too thin without later seasons) is left out
      const known = (row: number): boolean => vg.dims.some((_, j) => !Number.isNaN(vg.z[row * vg.d + j] as number) && (vg.redundancy[j] as number) > 0);
      for (const row of chosen.filter(known).sort((a, b) => a - b)) {
        const target = playerTarget(view, { group, row });
        const result = findProspectComps(view, outcomes, target, { ...options.prospect, asOf: season, includeCensored: false });
        out.push(rawForecastOf(vg, group, row, result.outlook, outcomes, horizon, reachedOf));
      }
    }
  }
  return out;
}

/** The forecast of one prospect-season from its outlook (made as of `outlook.as_of_season`), with its truth when the data holds it. */
export function rawForecastOf(
  g: StoredGroup, group: PositionGroup, row: number, o: Outlook, outcomes: Outcomes, horizon: number, reachedOf: Float64Array,
): RawForecast {
  const kind: OutcomeKind = isPitcherGroup(group) ? 'pitcher' : 'hitter';
  const season = g.season[row] as number;
  const complete = season + horizon <= outcomes.lastSeason && o.as_of_season === season;
  const future = complete ? outcomes.futureOf(g.player[row] as number, kind, season, horizon) : null;
  return {
    kind, group, player: g.player[row] as number, row, season,
    level: g.level[row] as number, age: g.age[row] as number, sample: g.sample[row] as number,
    levelBefore: highestLevelBefore(g, row), ...seasonAcrossLevels(g, row), profile: profileOf(g, row),
    comps: { used: o.comps_used, effective: o.comps_effective, share: nan(o.reached_top_level), peak: spreadOf(peakSummaryOf(o)), seasons: spreadOf(o.top_level_seasons) },
    matched: { n: o.baseline.player_seasons, share: nan(o.baseline.reached_top_level), peak: spreadOf(peakSummaryOf(o.baseline)), seasons: spreadOf(o.baseline.top_level_seasons) },
    levelAge: levelAgeRate(g, row, Math.min(season, o.as_of_season), horizon, reachedOf),
    truth: future ? { reached: future.reached_top_level, peak: peakOf(future), seasons: future.top_level_seasons } : null,
  };
}

/** Whether each row's player reached the top level in its complete window (NaN when incomplete). */
export function rowOutcomes(g: StoredGroup, outcomes: Outcomes, kind: OutcomeKind, horizon: number): Float64Array {
  const out = new Float64Array(g.n).fill(NaN);
  for (let i = 0; i < g.n; i++) {
    const s = g.season[i] as number;
    if (s + horizon > outcomes.lastSeason) continue;
    out[i] = outcomes.futureOf(g.player[i] as number, kind, s, horizon).reached_top_level ? 1 : 0;
  }
  return out;
}

/** Share reached among earlier rows of the group at the row's level, age within the outlook's window, window complete by `season`. */
function levelAgeRate(g: StoredGroup, row: number, season: number, horizon: number, reached: Float64Array): { n: number; share: number } {
  const level = g.level[row] as number, age = g.age[row] as number, w = OUTLOOK_CONSTANTS.ageWindow;
  let n = 0, hits = 0;
  for (let i = 0; i < g.n; i++) {
    if (g.level[i] !== level || (g.season[i] as number) + horizon > season || i === row || g.player[i] === g.player[row]) continue;
    const a = g.age[i] as number;
    if (!(a >= age - w && a <= age + w)) continue;
    const r = reached[i] as number;
    if (Number.isNaN(r)) continue;
    n++;
    hits += r;
  }
  return { n, share: n > 0 ? hits / n : NaN };
}

/** Highest level of each player-season of a group, keyed player * 10000 + season (cached per season column, which views share). */
const highest = new WeakMap<Int32Array, Map<number, number>>();
function highestLevelBefore(g: StoredGroup, row: number): number {
  let m = highest.get(g.season);
  if (!m) {
    m = new Map();
    for (let i = 0; i < g.n; i++) {
      const key = (g.player[i] as number) * 10000 + (g.season[i] as number);
      m.set(key, Math.max(m.get(key) ?? -1, g.level[i] as number));
    }
    highest.set(g.season, m);
  }
  return m.get((g.player[row] as number) * 10000 + (g.season[row] as number) - 1) ?? -1;
}

/** Lowest level and PA or BF summed over levels of each player-season of a group, keyed player * 10000 + season. */
const across = new WeakMap<Int32Array, Map<number, { lowest: number; sample: number }>>();
function seasonAcrossLevels(g: StoredGroup, row: number): { climbed: boolean; seasonSample: number } {
  let m = across.get(g.season);
  if (!m) {
    m = new Map();
    for (let i = 0; i < g.n; i++) {
      const key = (g.player[i] as number) * 10000 + (g.season[i] as number);
      const e = m.get(key);
      const level = g.level[i] as number, sample = g.sample[i] as number;
      if (e) m.set(key, { lowest: Math.min(e.lowest, level), sample: e.sample + sample });
      else m.set(key, { lowest: level, sample });
    }
    across.set(g.season, m);
  }
  const e = m.get((g.player[row] as number) * 10000 + (g.season[row] as number));
  return { climbed: e !== undefined && e.lowest < (g.level[row] as number), seasonSample: e?.sample ?? (g.sample[row] as number) };
}

function profileOf(g: StoredGroup, row: number): Record<string, number> {
  const out: Record<string, number> = {};
  g.dims.forEach((dim, j) => {
    const v = g.z[row * g.d + j] as number;
    if (!Number.isNaN(v)) out[dim.name] = v;
  });
  return out;
}
