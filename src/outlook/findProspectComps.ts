import { QueryError, UsageError } from '../errors/KindredError.ts';
import { isPitcherGroup } from '../profiles/positionGroup.ts';
import { eligibleRows } from '../query/eligibleRows.ts';
import { DEFAULT_COMPS_OPTIONS, effectiveWeights, findCompsWithRows, type CompsOptions } from '../query/findComps.ts';
import { likeness } from '../query/likeness.ts';
import { missingAwareDistance, targetWeight } from '../query/missingAwareDistance.ts';
import type { PoolFilter } from '../query/PoolFilter.ts';
import type { ProfileStore, StoredGroup } from '../query/ProfileStore.ts';
import type { Target } from '../query/Target.ts';
import type { Outcomes } from './Outcomes.ts';
import { OUTLOOK_CONSTANTS } from './outlookConstants.ts';
import { pathDistance, pathTargetSteps, type PathScore } from './pathDistance.ts';
import { summariseOutlook } from './summariseOutlook.ts';
import type { CompOutcome, OutcomeKind, PathStep, ProspectComp, ProspectResult } from './types.ts';

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
}

/**
 * Defaults of prospect comps (project choices, from the honesty check in bench/outlook.bench.ts):
 * 25 comps rather than 10, since the outlook is a distribution drawn from them; a coverage floor of
 * 0.25 rather than 0.5, since comps come from earlier seasons, often from before the tracking
 * measurements (exit velocity, sprint speed, arm, pitch tracking) were recorded, and those carry much
 * of a recent target's weight: at 0.5 most historical comps would be left out.
 */
export const DEFAULT_PROSPECT_OPTIONS: ProspectOptions = {
  comps: { ...DEFAULT_COMPS_OPTIONS, k: 25, minCoverage: 0.25 },
  horizon: OUTLOOK_CONSTANTS.defaultHorizon,
  path: 1,
  includeCensored: false,
};

interface Scored {
  readonly row: number;
  readonly player: number;
  readonly season: number;
  readonly d2: number;
  readonly weight: number;
  readonly coverage: number;
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

const round = (x: number, digits: number): number => Number(x.toFixed(digits));
const rowKey = (player: number, season: number, level: number): string => `${player}|${season}|${level}`;

/** Rows of a group by player, season and level (cached per loaded group). */
const lookups = new WeakMap<StoredGroup, Map<string, number>>();
function rowLookup(g: StoredGroup): Map<string, number> {
  let m = lookups.get(g);
  if (!m) {
    m = new Map();
    for (let i = 0; i < g.n; i++) m.set(rowKey(g.player[i] as number, g.season[i] as number, g.level[i] as number), i);
    lookups.set(g, m);
  }
  return m;
}

/** The target's aligned seasons: his season, then each season before it at his highest level that season. */
function targetSteps(store: ProfileStore, g: StoredGroup, target: Target & { season: number }, n: number): TargetStep[] {
  const steps: TargetStep[] = [{ row: target.row, season: target.season, level: g.level[target.row] as number }];
  for (let j = 1; j < n; j++) {
    const season = target.season - j;
    let best = -1;
    for (let i = 0; i < g.n; i++) {
      if (g.player[i] !== target.player || g.season[i] !== season) continue;
      if (best < 0 || (g.level[i] as number) > (g.level[best] as number) || (g.level[i] === g.level[best] && (g.sample[i] as number) > (g.sample[best] as number))) best = i;
    }
    if (best < 0) {
      const p = store.players[target.player];
      throw new QueryError(
        'kindred.query.noSeason',
        `${p?.playerId ?? ''} ${p?.name ?? ''} has no ${target.group} profile in ${season}: --path ${n} needs ${n} consecutive profiled seasons ending ${target.season}`,
        { player_id: p?.playerId ?? '', season },
      );
    }
    steps.push({ row: best, season, level: g.level[best] as number });
  }
  return steps;
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
  const { horizon, path } = options;
  if (!Number.isInteger(horizon) || horizon < 1) throw new UsageError(`--horizon ${horizon}: expected a whole number of seasons, 1 or more`, { value: horizon });
  if (!Number.isInteger(path) || path < 1) throw new UsageError(`--path ${path}: expected a whole number of seasons, 1 or more`, { value: path });
  const season = target.season;
  const age = target.age;
  if (target.kind !== 'player' || season === null || target.level === null || target.row < 0) {
    throw new QueryError('kindred.query.badTarget', 'prospect comps need a player-season as the target (not a --want profile)');
  }
  if (age === null) {
    const p = store.players[target.player];
    throw new QueryError('kindred.query.badTarget', `${p?.playerId ?? ''} ${p?.name ?? ''} has no birth date: prospect comps are matched by age`, { player_id: p?.playerId ?? '' });
  }
  const g = store.groups.get(target.group);
  if (!g) throw new QueryError('kindred.query.emptyPool', `the store has no ${target.group} profiles`, { group: target.group });
  const asOf = options.asOf ?? outcomes.lastSeason;
  const kind: OutcomeKind = isPitcherGroup(target.group) ? 'pitcher' : 'hitter';
  const levelIdx = g.level[target.row] as number;
  const steps = targetSteps(store, g, { ...target, season }, path);
  const lookup = path > 1 ? rowLookup(g) : null;
  const ageMin = age - OUTLOOK_CONSTANTS.ageWindow;
  const ageMax = age + OUTLOOK_CONSTANTS.ageWindow;

  const offsetsOf = (row: number): number[] | null => {
    if (!lookup) return [row * g.d];
    const out: number[] = [row * g.d];
    const player = g.player[row] as number;
    const s = g.season[row] as number;
    for (let j = 1; j < steps.length; j++) {
      const r = lookup.get(rowKey(player, s - j, (steps[j] as TargetStep).level));
      if (r === undefined) return null;
      out.push(r * g.d);
    }
    return out;
  };
  const callerInclude = options.comps.filter.include;
  const prospectRule = (row: number): boolean => {
    const a = g.age[row] as number;
    return (
      g.level[row] === levelIdx &&
      (g.season[row] as number) < season &&
      a >= ageMin &&
      a <= ageMax &&
      (lookup === null || offsetsOf(row) !== null) &&
      (callerInclude === undefined || callerInclude(row))
    );
  };
  const filter: PoolFilter = { ...options.comps.filter, include: prospectRule };
  const weights = effectiveWeights(g, options.comps);
  const wT = targetWeight(target.z, weights);
  if (!(wT > 0)) throw new QueryError('kindred.query.badTarget', 'the target has no value on any weighted dimension', { group: target.group });
  const pathTarget = path > 1 ? pathTargetSteps(steps.map((s) => Float64Array.from(g.z.subarray(s.row * g.d, s.row * g.d + g.d))), weights) : null;
  const { mask, count } = eligibleRows(store, g, filter, new Set([target.player]));

  const scored: Scored[] = [];
  let censoredRows = 0;
  for (let row = 0; row < g.n; row++) {
    if (mask[row] !== 1) continue;
    const s = g.season[row] as number;
    const censored = s + horizon > asOf;
    if (censored) censoredRows++;
    const base = { row, player: g.player[row] as number, season: s, censored };
    if (pathTarget) {
      const offsets = offsetsOf(row);
      if (!offsets) continue;
      const ps = pathDistance(pathTarget, g.z, offsets, weights);
      if (!(ps.coverage >= options.comps.minCoverage) || !Number.isFinite(ps.d2)) continue;
      scored.push({ ...base, d2: ps.d2, weight: ps.weight, coverage: ps.coverage, offsets, steps: ps.steps });
    } else {
      const p = missingAwareDistance(target.z, g.z, row * g.d, weights, wT);
      if (!(p.coverage >= options.comps.minCoverage) || !Number.isFinite(p.d2)) continue;
      scored.push({ ...base, d2: p.d2, weight: wT, coverage: p.coverage, offsets: null, steps: null });
    }
  }
  scored.sort((a, b) => a.d2 - b.d2 || b.season - a.season);

  const used: Scored[] = [];
  const usedPlayers = new Set<number>();
  for (const s of scored) {
    if (used.length >= options.comps.k) break;
    if (s.censored || (!options.comps.allSeasons && usedPlayers.has(s.player))) continue;
    usedPlayers.add(s.player);
    used.push(s);
  }
  const cutoff = used.length >= options.comps.k ? (used[used.length - 1] as Scored).d2 : Infinity;
  const left: Scored[] = [];
  const leftPlayers = new Set<number>();
  for (const s of scored) {
    if (!(s.d2 < cutoff)) break;
    if (!s.censored || (!options.comps.allSeasons && (usedPlayers.has(s.player) || leftPlayers.has(s.player)))) continue;
    leftPlayers.add(s.player);
    left.push(s);
  }
  const listed = [...used, ...(options.includeCensored ? left : [])].sort((a, b) => a.d2 - b.d2 || b.season - a.season);

  // The comps as the comps query describes them (dimensions, grades, alike, apart), for the listed rows only.
  const listedRows = new Set(listed.map((s) => s.row));
  const described = findCompsWithRows(store, target, {
    ...options.comps,
    space: 'input',
    k: Math.max(1, listed.length),
    exact: true,
    allSeasons: true,
    minCoverage: 0,
    filter: { ...filter, include: (row) => listedRows.has(row) },
  });
  const compOfRow = new Map(described.rows.map((row, i) => [row, described.result.comps[i]]));

  const likenessOf = (s: Scored): number => likeness(Math.sqrt(s.d2), s.weight);
  const outcomeOf = (s: Scored): CompOutcome => outcomes.futureOf(s.player, kind, s.season, horizon, asOf);
  const comps: ProspectComp[] = listed.map((s, i) => {
    const comp = compOfRow.get(s.row);
    if (!comp) throw new RangeError(`internal: row ${s.row} was not described`);
    return {
      ...comp,
      rank: i + 1,
      likeness: round(likenessOf(s), 1),
      distance: round(Math.sqrt(s.d2), 4),
      coverage: round(s.coverage, 3),
      censored: s.censored,
      outcome: outcomeOf(s),
      ...(s.offsets && s.steps ? { path: pathSteps(store, g, s.offsets, s.steps) } : {}),
    };
  });

  const baselineItems: { weight: number; outcome: CompOutcome }[] = [];
  for (let i = 0; i < g.n; i++) {
    if (mask[i] !== 1) continue;
    const s = g.season[i] as number;
    if (s + horizon <= asOf) baselineItems.push({ weight: 1, outcome: outcomes.futureOf(g.player[i] as number, kind, s, horizon, asOf) });
  }
  const outlookFigures = summariseOutlook(used.map((s) => ({ weight: likenessOf(s), outcome: outcomeOf(s) })), kind);

  return {
    query: {
      ...described.result.query,
      k: options.comps.k,
      horizon_seasons: horizon,
      path_seasons: path,
      include_censored: options.includeCensored,
      path: steps.map((st) => {
        const a = g.age[st.row] as number;
        return { season: st.season, level: store.levels[st.level] ?? '', age: Number.isNaN(a) ? null : a };
      }),
    },
    pool: {
      ...described.result.pool,
      eligible: count,
      rules: { level: target.level, age_min: ageMin, age_max: ageMax, seasons_before: season, complete_window_to: asOf - horizon },
      complete_window: count - censoredRows,
      censored: censoredRows,
    },
    comps,
    outlook: {
      horizon_seasons: horizon,
      as_of_season: asOf,
      comps_used: used.length,
      comps_censored: left.length,
      ...outlookFigures,
      baseline: { player_seasons: baselineItems.length, ...summariseOutlook(baselineItems, kind) },
    },
  };
}

function pathSteps(store: ProfileStore, g: StoredGroup, offsets: readonly number[], steps: PathScore['steps']): PathStep[] {
  return steps.map((st, j) => {
    const r = (offsets[j] as number) / g.d;
    const a = g.age[r] as number;
    return {
      season: g.season[r] as number,
      level: store.levels[g.level[r] as number] ?? '',
      age: Number.isNaN(a) ? null : a,
      likeness: round(st.likeness, 1),
      coverage: round(st.coverage, 3),
    };
  });
}
