import { QueryError } from '../errors/KindredError.ts';
import { ParameterError } from '../errors/ParameterError.ts';
import { isPitcherGroup } from '../profiles/positionGroup.ts';
import { describeComp } from '../query/describeComp.ts';
import { echoPool, echoQuery } from '../query/echoQuery.ts';
import { describePool } from '../query/describePool.ts';
import { DEFAULT_COMPS_OPTIONS, type CompsOptions } from '../query/findComps.ts';
import { likeness, UNRELATED_LIKENESS } from '../query/likeness.ts';
import type { PoolFilter } from '../query/PoolFilter.ts';
import { prepareQuery, type PreparedQuery } from '../query/prepareQuery.ts';
import { prospectMissingRuleOf } from '../query/missingRuleOf.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';
import { closerFirst, rankScored } from '../query/rankScored.ts';
import { scoreRow, type ScoredRow } from '../query/scoreRow.ts';
import { storedGroup } from '../query/storedGroup.ts';
import type { Target } from '../query/Target.ts';
import { valueAt } from '../query/valueAt.ts';
import { round } from '../stats/round.ts';
import type { Outcomes } from '../outlook/Outcomes.ts';
import { OUTLOOK_CONSTANTS } from '../outlook/outlookConstants.ts';
import { pathDistance, pathTargetSteps, type PathScore } from './pathDistance.ts';
import { summariseOutlook } from '../outlook/summariseOutlook.ts';
import { effectiveCount } from '../stats/effectiveCount.ts';
import type { CompOutcome, OutcomeKind } from '../outlook/CompOutcome.ts';
import type { PathStep, ProspectComp, ProspectPoolEcho, ProspectResult } from './ProspectResult.ts';

export interface ProspectOptions {
  readonly comps: CompsOptions;
  /** Seasons of follow-up after each comp's season. */
  readonly horizon: number;
  /** Aligned seasons to match, the target's season and the N - 1 before it (1: his season alone). */
  readonly path: number;
  /** List censored comps too (never in the outlook). */
  readonly includeCensored: boolean;
  /**
   * Outcomes are read as known at the end of this season (default: the data's last season). A cut-off
   * earlier than the data's end makes a forecast that could have been made then (honesty checks).
   */
  readonly asOf?: number;
  /**
   * Playing-time band: comps' samples (PA for hitters, BF for pitchers) within this factor of the target's
   * (2: from half to twice his); absent or 0: no band. The base rate uses the same pool.
   */
  readonly sampleBand?: number;
  /**
   * Level-by-age path: comps must have been at the target's level of the season before (his highest level
   * in his group that season, or nowhere) at the same age offset. The base rate uses the same pool.
   */
  readonly levelPath?: boolean;
}

/**
 * Defaults of prospect comps (project choices, from the honesty check in bench/outlook.bench.ts):
 * 25 comps rather than 10, since the outlook is a distribution drawn from them; a coverage floor of
 * 0.25 rather than 0.5, since comps come from earlier seasons, often from before the tracking
 * measurements (exit velocity, run speed, arm, pitch tracking) were recorded, and those carry much
 * of a recent target's weight: at 0.5 most historical comps would be left out.
 */
export const DEFAULT_PROSPECT_OPTIONS: ProspectOptions = {
  comps: { ...DEFAULT_COMPS_OPTIONS, k: 25, minCoverage: 0.25 },
  horizon: OUTLOOK_CONSTANTS.defaultHorizon,
  path: 1,
  includeCensored: false,
};

/** A pool row scored for a prospect: his player and season, the weight his likeness is scaled by, censoring. */
interface ProspectScored extends ScoredRow {
  readonly player: number;
  readonly season: number;
  readonly weight: number;
  readonly censored: boolean;
  /** With a path: the candidate's row offsets per step, and each step's own score. */
  readonly offsets: readonly number[] | null;
  readonly steps: PathScore['steps'] | null;
}

interface TargetStep {
  readonly row: number;
  readonly season: number;
  readonly level: number;
}

/** The prospect pool: the filter with the prospect rules, the age band, and each row's aligned rows. */
interface ProspectPool {
  readonly filter: PoolFilter;
  readonly ageMin: number;
  readonly ageMax: number;
  /** A row's offsets (row * d) for each aligned season, or null when he lacks one. */
  readonly offsetsOf: (row: number) => number[] | null;
}

const rowKey = (player: number, season: number, level: number): string => `${player}|${season}|${level}`;

/** Rows of a group by player, season and level (cached per loaded group). */
const lookups = new WeakMap<StoredGroup, Map<string, number>>();
function rowLookup(g: StoredGroup): Map<string, number> {
  let m = lookups.get(g);
  if (!m) {
    m = new Map();
    for (let i = 0; i < g.n; i++) m.set(rowKey(valueAt(g.player, i), valueAt(g.season, i), valueAt(g.level, i)), i);
    lookups.set(g, m);
  }
  return m;
}

/** Highest level of each player-season of a group (cached per loaded group). */
const highestLevels = new WeakMap<StoredGroup, Map<number, number>>();
function highestLevelOf(g: StoredGroup): Map<number, number> {
  let m = highestLevels.get(g);
  if (!m) {
    m = new Map();
    for (let i = 0; i < g.n; i++) {
      const key = valueAt(g.player, i) * 10000 + valueAt(g.season, i);
      m.set(key, Math.max(m.get(key) ?? -1, valueAt(g.level, i)));
    }
    highestLevels.set(g, m);
  }
  return m;
}

/** The target's aligned seasons: his season, then each season before it at his highest level that season. */
function targetSteps(store: ProfileStore, g: StoredGroup, target: Target, season: number, n: number): TargetStep[] {
  const steps: TargetStep[] = [{ row: target.row, season, level: valueAt(g.level, target.row) }];
  for (let j = 1; j < n; j++) {
    const s = season - j;
    let best = -1;
    for (let i = 0; i < g.n; i++) {
      if (g.player[i] !== target.player || g.season[i] !== s) continue;
      const level = valueAt(g.level, i);
      if (best < 0 || level > valueAt(g.level, best) || (level === valueAt(g.level, best) && valueAt(g.sample, i) > valueAt(g.sample, best))) best = i;
    }
    if (best < 0) {
      const p = store.players[target.player];
      throw new QueryError(
        'kindred.query.noSeason',
        `${p?.playerId ?? ''} ${p?.name ?? ''} has no ${target.group} profile in ${s}: a path of ${n} seasons needs ${n} consecutive profiled seasons ending ${season}`,
        { player_id: p?.playerId ?? '', season: s },
      );
    }
    steps.push({ row: best, season: s, level: valueAt(g.level, best) });
  }
  return steps;
}

/** The target's season and age, checked: prospect comps need a player-season with a birth date. */
function prospectTarget(store: ProfileStore, target: Target, options: ProspectOptions): { season: number; age: number } {
  const { horizon, path } = options;
  if (!Number.isInteger(horizon) || horizon < 1) throw new ParameterError('horizon', `expected a whole number of seasons, 1 or more, got ${horizon}`, { context: { value: horizon } });
  if (!Number.isInteger(path) || path < 1) throw new ParameterError('path', `expected a whole number of seasons, 1 or more, got ${path}`, { context: { value: path } });
  const { season, age } = target;
  if (target.kind !== 'player' || season === null || target.level === null || target.row < 0) {
    throw new QueryError('kindred.query.badTarget', 'prospect comps need a player-season as the target (not a hand-built profile)');
  }
  if (age === null) {
    const p = store.players[target.player];
    throw new QueryError('kindred.query.badTarget', `${p?.playerId ?? ''} ${p?.name ?? ''} has no birth date: prospect comps are matched by age`, { player_id: p?.playerId ?? '' });
  }
  return { season, age };
}

/**
 * The prospect pool rules on top of the caller's filter: the target's level, earlier seasons, an age
 * within OUTLOOK_CONSTANTS.ageWindow, and with a path the same level at each aligned earlier season.
 */
function prospectPool(g: StoredGroup, steps: readonly TargetStep[], season: number, age: number, callerFilter: PoolFilter, options: ProspectOptions): ProspectPool {
  const lookup = steps.length > 1 ? rowLookup(g) : null;
  const levelIdx = steps[0]?.level ?? -1;
  const ageMin = age - OUTLOOK_CONSTANTS.ageWindow;
  const ageMax = age + OUTLOOK_CONSTANTS.ageWindow;
  const offsetsOf = (row: number): number[] | null => {
    if (!lookup) return [row * g.d];
    const out: number[] = [row * g.d];
    const player = valueAt(g.player, row);
    const s = valueAt(g.season, row);
    for (let j = 1; j < steps.length; j++) {
      const r = lookup.get(rowKey(player, s - j, steps[j]?.level ?? -1));
      if (r === undefined) return null;
      out.push(r * g.d);
    }
    return out;
  };
  const callerInclude = callerFilter.include;
  const band = options.sampleBand !== undefined && options.sampleBand > 0 ? options.sampleBand : 0;
  if (band !== 0 && !(band >= 1)) throw new ParameterError('sampleBand', `expected a factor of 1 or more, got ${band}`, { context: { value: band } });
  const targetRow = steps[0]?.row ?? -1;
  const targetSample = targetRow >= 0 ? valueAt(g.sample, targetRow) : 0;
  const highest = options.levelPath ? highestLevelOf(g) : null;
  const levelBefore = (row: number): number => highest?.get(valueAt(g.player, row) * 10000 + valueAt(g.season, row) - 1) ?? -1;
  const targetBefore = highest && targetRow >= 0 ? levelBefore(targetRow) : -1;
  const include = (row: number): boolean => {
    const a = valueAt(g.age, row);
    return (
      g.level[row] === levelIdx &&
      valueAt(g.season, row) < season &&
      a >= ageMin &&
      a <= ageMax &&
      (lookup === null || offsetsOf(row) !== null) &&
      (band === 0 || (valueAt(g.sample, row) * band >= targetSample && valueAt(g.sample, row) <= targetSample * band)) &&
      (highest === null || levelBefore(row) === targetBefore) &&
      (callerInclude === undefined || callerInclude(row))
    );
  };
  return { filter: { ...callerFilter, include }, ageMin, ageMax, offsetsOf };
}

/** Every pool row scored (by pathDistance with a path), and the pool rows whose follow-up is censored. */
function scoreProspects(q: PreparedQuery, pool: ProspectPool, steps: readonly TargetStep[], horizon: number, asOf: number): { scored: ProspectScored[]; censoredRows: number } {
  const g = q.group;
  const pathTarget = steps.length > 1 ? pathTargetSteps(steps.map((s) => Float64Array.from(g.z.subarray(s.row * g.d, s.row * g.d + g.d))), q.weights) : null;
  const scored: ProspectScored[] = [];
  let censoredRows = 0;
  for (let row = 0; row < g.n; row++) {
    if (q.mask[row] !== 1) continue;
    const season = valueAt(g.season, row);
    const censored = season + horizon > asOf;
    if (censored) censoredRows++;
    const base = { row, player: valueAt(g.player, row), season, censored };
    if (pathTarget) {
      const offsets = pool.offsetsOf(row);
      if (!offsets) continue;
      const ps = pathDistance(pathTarget, g.z, offsets, q.weights, q.missing);
      scored.push({ ...base, d2: ps.d2, weight: ps.weight, coverage: ps.coverage, offsets, steps: ps.steps });
    } else {
      const p = scoreRow(q, row, null);
      scored.push({ ...base, d2: p.d2, weight: q.targetWeight, coverage: p.coverage, offsets: null, steps: null });
    }
  }
  return { scored, censoredRows };
}

/**
 * The comps: the k closest uncensored rows (rankScored: one season per player unless allSeasons),
 * and the players with a censored season closer than the k-th comp (who would have been comps).
 */
function chooseProspects(g: StoredGroup, scored: readonly ProspectScored[], comps: CompsOptions): { used: ProspectScored[]; left: ProspectScored[] } {
  const settings = { k: comps.k, allSeasons: comps.allSeasons, minCoverage: comps.minCoverage };
  const used = rankScored(g, scored.filter((s) => !s.censored), settings);
  const cutoff = used.length >= comps.k ? (used[used.length - 1]?.d2 ?? Infinity) : Infinity;
  const usedPlayers = new Set(used.map((s) => s.player));
  const closerCensored = scored.filter((s) => s.censored && s.d2 < cutoff && (comps.allSeasons || !usedPlayers.has(s.player)));
  return { used, left: rankScored(g, closerCensored, { ...settings, k: Infinity }) };
}

/**
 * Historical comps for a prospect and what became of them.
 *
 * Pool: earlier seasons (before the target's) in the target's position group, at the target's level,
 * at an age within OUTLOOK_CONSTANTS.ageWindow (1) of his, plus the usual filters; with `path` N > 1
 * only players who were also at the target's level of each of the N - 1 earlier aligned seasons
 * (same offset in seasons, hence in age). Comps are ranked by the missing-aware distance in the input
 * space (exact scan; a store's learned space is not used, since the trajectory distance is defined on
 * the profiles), or by the trajectory distance of pathDistance, one season per player (his closest).
 *
 * Censoring: a comp season c is censored when c + horizon > asOf (his follow-up is not all known). The
 * comps are the k closest players at uncensored seasons; `comps_censored` counts the other players with
 * a censored season closer than the k-th comp (they would have been comps). With includeCensored they
 * are listed too, flagged, but they never enter the outlook.
 *
 * Outlook: summariseOutlook over the comps, each weighted by his likeness. Baseline: the same summary
 * over every uncensored player-season of the pool, unweighted (the level-and-age base rate).
 */
export function findProspectComps(store: ProfileStore, outcomes: Outcomes, target: Target, options: ProspectOptions): ProspectResult {
  const { horizon } = options;
  const { season, age } = prospectTarget(store, target, options);
  const g = storedGroup(store, target.group);
  const asOf = options.asOf ?? outcomes.lastSeason;
  const kind: OutcomeKind = isPitcherGroup(target.group) ? 'pitcher' : 'hitter';
  const steps = targetSteps(store, g, target, season, options.path);
  const pool = prospectPool(g, steps, season, age, options.comps.filter, options);
  const q = prepareQuery(store, target, { ...options.comps, filter: pool.filter, missing: options.comps.missing ?? prospectMissingRuleOf(target.group) });
  const all = scoreProspects(q, pool, steps, horizon, asOf);
  const { censoredRows } = all;
  // a comp no more alike than two unrelated players tells nothing about the target: left out (counted)
  const scored = all.scored.filter((s) => likeness(Math.sqrt(s.d2), s.weight) > UNRELATED_LIKENESS);
  const belowFloor = all.scored.length - scored.length;
  const { used, left } = chooseProspects(g, scored, options.comps);
  const listed = [...used, ...(options.includeCensored ? left : [])].sort(closerFirst(g));

  const likenessOf = (s: ProspectScored): number => likeness(Math.sqrt(s.d2), s.weight);
  const outcomeOf = (s: ProspectScored): CompOutcome => outcomes.futureOf(s.player, kind, s.season, horizon, asOf);
  const comps: ProspectComp[] = listed.map((s, i) => ({
    ...describeComp(q, s, i + 1, { space: null, attributions: false, likenessWeight: s.weight }),
    censored: s.censored,
    outcome: outcomeOf(s),
    ...(s.offsets && s.steps ? { path: pathSteps(store, g, s.offsets, s.steps) } : {}),
  }));
  const baseline = baselineOutlook(q, outcomes, kind, horizon, asOf);
  return {
    query: {
      ...echoQuery(q, options.comps.k, 'exact', 'input'),
      horizon_seasons: horizon,
      path_seasons: options.path,
      include_censored: options.includeCensored,
      path: steps.map((st) => {
        const a = valueAt(g.age, st.row);
        return { season: st.season, level: store.levels[st.level] ?? '', age: Number.isNaN(a) ? null : a };
      }),
    },
    pool: {
      ...prospectPoolEcho(q, pool, target, season, asOf, horizon, censoredRows),
      summary: describePool({ ...options.comps.filter, levels: [target.level ?? ''], seasonTo: season - 1, ageMin: pool.ageMin, ageMax: pool.ageMax }, null, target.group),
      likeness_floor: round(UNRELATED_LIKENESS, 1),
      below_likeness_floor: belowFloor,
    },
    comps,
    warnings: establishedWarning(store, g, target, season),
    outlook: {
      horizon_seasons: horizon,
      as_of_season: asOf,
      comps_used: used.length,
      comps_censored: left.length,
      comps_effective: round(effectiveCount(used.map(likenessOf)), 1),
      ...summariseOutlook(used.map((s) => ({ weight: likenessOf(s), outcome: outcomeOf(s) })), kind),
      baseline,
    },
  };
}

/** Top-level seasons (the target's included) from which a player counts as established there (project choice). */
export const ESTABLISHED_TOP_SEASONS = 2;

/**
 * The warning for a target already established at the top level (at the roster's highest level in his
 * season and in at least ESTABLISHED_TOP_SEASONS of his seasons up to it): his comps are still
 * earlier players at his level and age, but "reached the top level" and the outlook answer a question
 * that is settled for him. A warning rather than a refusal: the comps' next seasons (how long such
 * players stayed, how they peaked) still say something, and a batch over a whole roster should not stop
 * at its regulars.
 */
function establishedWarning(store: ProfileStore, g: StoredGroup, target: Target, season: number): string[] {
  const top = store.levels.length - 1;
  if (target.level !== store.levels[top]) return [];
  const seasons = new Set<number>();
  for (let i = 0; i < g.n; i++) if (g.player[i] === target.player && g.level[i] === top && valueAt(g.season, i) <= season) seasons.add(valueAt(g.season, i));
  if (seasons.size < ESTABLISHED_TOP_SEASONS) return [];
  const p = store.players[target.player];
  return [
    `${p?.name ?? ''} (${p?.playerId ?? ''}) is established at the top level (${store.levels[top] ?? ''}, ${seasons.size} seasons to ${season}): ` +
      'the outlook describes earlier players at his level and age, not whether he will get there.',
  ];
}

/** The pool echo with the prospect rules and its censoring counts. */
function prospectPoolEcho(q: PreparedQuery, pool: ProspectPool, target: Target, season: number, asOf: number, horizon: number, censoredRows: number): ProspectPoolEcho {
  return {
    ...echoPool(q),
    rules: { level: target.level ?? '', age_min: pool.ageMin, age_max: pool.ageMax, seasons_before: season, complete_window_to: asOf - horizon },
    complete_window: q.eligible - censoredRows,
    censored: censoredRows,
  };
}

/** The level-and-age base rate: the outlook summary over every uncensored pool row, unweighted. */
function baselineOutlook(q: PreparedQuery, outcomes: Outcomes, kind: OutcomeKind, horizon: number, asOf: number): ProspectResult['outlook']['baseline'] {
  const g = q.group;
  const items: { weight: number; outcome: CompOutcome }[] = [];
  for (let i = 0; i < g.n; i++) {
    if (q.mask[i] !== 1) continue;
    const s = valueAt(g.season, i);
    if (s + horizon <= asOf) items.push({ weight: 1, outcome: outcomes.futureOf(valueAt(g.player, i), kind, s, horizon, asOf) });
  }
  return { player_seasons: items.length, ...summariseOutlook(items, kind) };
}

function pathSteps(store: ProfileStore, g: StoredGroup, offsets: readonly number[], steps: PathScore['steps']): PathStep[] {
  return steps.map((st, j) => {
    const r = (offsets[j] ?? NaN) / g.d;
    const a = valueAt(g.age, r);
    return {
      season: valueAt(g.season, r),
      level: store.levels[valueAt(g.level, r)] ?? '',
      age: Number.isNaN(a) ? null : a,
      likeness: round(st.likeness, 1),
      coverage: round(st.coverage, 3),
    };
  });
}
