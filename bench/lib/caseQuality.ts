/**
 * The comps-quality cases of the quality bench, scored on a simulated league against the simulator's true
 * talents, with the comps a user gets by default (the default pool rules: his position, levels within one
 * of his, at least half his PA or BF; the default weighting):
 * - ratio cases (top-level hitters 400+ PA, SP 500+ BF, RP 150+ BF): for each target, the mean
 *   true-talent distance to his top-10 comps over the mean distance to the 10 truly nearest other players
 *   (each at his nearest season or window) of the same pool (1.00 is perfect, lower is better): what the
 *   profiles and weights achieve among the players the user asked about (what the pool rules cost is
 *   bench/poolQuality.bench.ts's figure). Talents are standardised over the
 *   group; talents a group's data cannot show are left out (TALENTS_SHOWN). A case's figure is the median
 *   over its targets. Planted twins and their originals are not ratio targets (a twin at distance 0 would
 *   make the ideal his alone).
 * - twins: for targets whose player has a planted twin (SimOptions.twinShare: the same true talents every
 *   season, other luck), the share whose twin is among the top-10 comps.
 * Targets are player-seasons at the top level whose own season's PA or BF is in the case's range, chosen
 * once from the single-season store, so every window is scored on the same targets (in a view over
 * windows, the window ending at the target's season, scored on the true talents of that season).
 */
import type { SimLeague } from '../../src/sim/simTypes.ts';
import { playerIndexOf } from '../../src/sim/SimTruth.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { findCompsWithRows, type CompsOptions } from '../../src/query/findComps.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import { eligibleRows } from '../../src/query/eligibleRows.ts';
import { DEFAULT_REACH, poolRules, type PoolReach } from '../../src/query/poolDefaults.ts';
import type { PositionGroup } from '../../src/profiles/positionGroup.ts';
import { quantileSorted } from '../../src/stats/quantile.ts';
import { groupTalents, sampleStream } from './compsQuality.ts';

export interface QualityCase {
  readonly name: string;
  readonly groups: readonly PositionGroup[];
  /** The target season's own PA (hitters) or BF (pitchers), inclusive. */
  readonly range: readonly [number, number];
}

/** The ratio cases of the quality bench (the issue table's rows). */
export const QUALITY_CASES: readonly QualityCase[] = [
  { name: 'top hitters 400+ PA', groups: ['C', 'IF', 'OF'], range: [400, 100000] },
  { name: 'top SP 500+ BF', groups: ['SP'], range: [500, 100000] },
  { name: 'top RP 150+ BF', groups: ['RP'], range: [150, 100000] },
];

const K = 10;

/** One chosen target: a player-season at the top level (store player index, season, level index). */
export interface CaseTarget {
  readonly group: PositionGroup;
  readonly player: number;
  readonly season: number;
  readonly level: number;
  /** The store player index of his planted twin, or -1. */
  readonly twin: number;
}

export interface ChosenTargets {
  /** Per case: targets without a twin (ratio targets). */
  readonly ratio: readonly (readonly CaseTarget[])[];
  /** Per case: targets with a planted twin. */
  readonly twins: readonly (readonly CaseTarget[])[];
}


/** Up to `n` of `xs`, drawn without replacement by a seeded shuffle. */
function sample<T>(xs: readonly T[], n: number, next: () => number): T[] {
  const a = [...xs];
  for (let i = a.length - 1; i > 0; i--) {
    const j = Math.floor(next() * (i + 1));
    [a[i], a[j]] = [a[j] as T, a[i] as T];
  }
  return a.slice(0, n);
}

/** The targets of every case, from the single-season store: `perCase` ratio targets and up to `twinsPerCase` twin targets. */
export function chooseTargets(store: ProfileStore, league: SimLeague, perCase: number, twinsPerCase: number, seed: number): ChosenTargets {
  const top = store.levels.length - 1;
  const next = sampleStream(seed);
  const simIndex = store.players.map((p) => playerIndexOf(p.playerId));
  const storeIndex = new Map(simIndex.map((s, i) => [s, i]));
  const ratio: CaseTarget[][] = [];
  const twins: CaseTarget[][] = [];
  for (const kase of QUALITY_CASES) {
    const plain: CaseTarget[] = [];
    const twinned: CaseTarget[] = [];
    for (const group of kase.groups) {
      const g = store.groups.get(group);
      if (!g) continue;
      for (let r = 0; r < g.n; r++) {
        const s = g.sample[r] as number;
        if (g.level[r] !== top || s < kase.range[0] || s > kase.range[1]) continue;
        const player = g.player[r] as number;
        const simTwin = league.players.twinOf[simIndex[player] ?? -1] ?? -1;
        const twin = simTwin >= 0 ? (storeIndex.get(simTwin) ?? -1) : -1;
        const t: CaseTarget = { group, player, season: g.season[r] as number, level: top, twin };
        if (simTwin >= 0) {
          if (twin >= 0) twinned.push(t);
        } else plain.push(t);
      }
    }
    ratio.push(sample(plain, perCase, next));
    twins.push(sample(twinned, twinsPerCase, next));
  }
  return { ratio, twins };
}


export interface CaseScores {
  /** Per case: the median ratio over its targets (NaN when none could be scored). */
  readonly median: readonly number[];
  /** Per case: each scored target's ratio. */
  readonly ratios: readonly (readonly number[])[];
  /** Per case: twins found among the top 10, and twin targets scored. */
  readonly twinsFound: readonly number[];
  readonly twinTargets: readonly number[];
  /** Per case: the ratios of targets with every dimension of the group (full) and of the others (partial: e.g. seasons before tracking). */
  readonly byCoverage: readonly { readonly full: readonly number[]; readonly partial: readonly number[] }[];
  /**
   * Per case: per talent (TALENTS_SHOWN order), the mean squared standardised gap between target and his
   * comps, and between target and his 10 truly nearest: which talents the comps fail to match.
   */
  readonly talentGaps: readonly { readonly names: readonly string[]; readonly comps: Float64Array; readonly ideal: Float64Array }[];
}

/** Talents that make up the bat (what "who hits like him" asks; the hitters case's gap in them must not grow). */
export const BAT_TALENTS: readonly string[] = ['contact', 'power', 'eye'];

/** The bat's gap: a case's mean squared standardised talent gap to the comps, summed over BAT_TALENTS (NaN without them). */
export function batGap(gaps: CaseScores['talentGaps'][number] | undefined): number {
  if (!gaps) return NaN;
  let s = 0;
  for (const name of BAT_TALENTS) {
    const j = gaps.names.indexOf(name);
    if (j < 0) return NaN;
    s += gaps.comps[j] as number;
  }
  return s;
}

export interface ScoreOptions {
  /** Comps options (default pool rules are added as the filter). */
  readonly compsOptions: CompsOptions;
  /** The pool's reach (default DEFAULT_REACH, what `kindred comps` uses). */
  readonly reach?: PoolReach;
}

/**
 * Scores the chosen targets in `view` (the store itself or a windowView of it): each target is the row of
 * his group at his level and season (his window ending that season).
 */
export function scoreCases(view: ProfileStore, league: SimLeague, chosen: ChosenTargets, o: ScoreOptions): CaseScores {
  const reach = o.reach ?? DEFAULT_REACH;
  const cache = new Map<PositionGroup, { rowOf: Map<string, number>; talents: Float64Array; t: number; names: readonly string[] }>();
  const prepared = (group: PositionGroup) => {
    let c = cache.get(group);
    if (c) return c;
    const g = view.groups.get(group);
    if (!g) return undefined;
    const rowOf = new Map<string, number>();
    for (let r = 0; r < g.n; r++) rowOf.set(`${g.player[r]}|${g.season[r]}|${g.level[r]}`, r);
    c = { rowOf, ...groupTalents(view, g, league.truth) };
    cache.set(group, c);
    return c;
  };
  const comps = (g: StoredGroup, row: number) => {
    const target = playerTarget(view, { group: g.group, row });
    const rules = poolRules(view, g, target, reach);
    const filter = {
      ...(rules.positions ? { positions: rules.positions } : {}),
      ...(rules.levels ? { levels: rules.levels } : {}),
      ...(rules.minSample !== undefined ? { minSample: rules.minSample } : {}),
    };
    const pool = eligibleRows(view, g, filter, new Set([target.player])).mask;
    return { target, pool, rows: findCompsWithRows(view, target, { ...o.compsOptions, exact: true, k: K, filter }).rows };
  };
  const median: number[] = [];
  const ratios: number[][] = [];
  const twinsFound: number[] = [];
  const twinTargets: number[] = [];
  const byCoverage: { full: number[]; partial: number[] }[] = [];
  const talentGaps: { names: readonly string[]; comps: Float64Array; ideal: Float64Array }[] = [];
  for (const [c] of QUALITY_CASES.entries()) {
    const list: number[] = [];
    const coverage = { full: [] as number[], partial: [] as number[] };
    let gaps: { names: readonly string[]; comps: Float64Array; ideal: Float64Array } | undefined;
    let gapTargets = 0;
    for (const ct of chosen.ratio[c] ?? []) {
      const g = view.groups.get(ct.group);
      const p = prepared(ct.group);
      if (!g || !p || p.t === 0) continue;
      const row = p.rowOf.get(`${ct.player}|${ct.season}|${ct.level}`);
      if (row === undefined || Number.isNaN(p.talents[row * p.t] as number)) continue;
      const { t, talents } = p;
      const dist = (a: number, b: number): number => {
        let s = 0;
        for (let j = 0; j < t; j++) s += ((talents[a * t + j] as number) - (talents[b * t + j] as number)) ** 2;
        return Math.sqrt(s);
      };
      const found = comps(g, row);
      const best = new Map<number, { d: number; r: number }>();
      for (let r = 0; r < g.n; r++) {
        const pl = g.player[r] as number;
        if (found.pool[r] !== 1 || pl === ct.player || Number.isNaN(talents[r * t] as number)) continue;
        const d = dist(row, r);
        const prev = best.get(pl);
        if (prev === undefined || d < prev.d) best.set(pl, { d, r });
      }
      const nearest = [...best.values()].sort((a, b) => a.d - b.d).slice(0, K);
      const ideal = nearest.reduce((a, b) => a + b.d, 0) / nearest.length;
      if (!(ideal > 0) || nearest.length < K) continue;
      const known = found.rows.filter((r) => !Number.isNaN(talents[r * t] as number));
      if (known.length < K) continue;
      const ratio = known.reduce((a, r) => a + dist(row, r), 0) / known.length / ideal;
      list.push(ratio);
      let full = true;
      for (let j = 0; j < g.d; j++) if (Number.isNaN(g.z[row * g.d + j] as number)) full = false;
      (full ? coverage.full : coverage.partial).push(ratio);
      gaps ??= { names: p.names, comps: new Float64Array(t), ideal: new Float64Array(t) };
      for (let j = 0; j < t; j++) {
        const x = talents[row * t + j] as number;
        for (const r of known) gaps.comps[j] = (gaps.comps[j] as number) + ((talents[r * t + j] as number) - x) ** 2 / known.length;
        for (const { r } of nearest) gaps.ideal[j] = (gaps.ideal[j] as number) + ((talents[r * t + j] as number) - x) ** 2 / nearest.length;
      }
      gapTargets++;
    }
    if (gaps) for (let j = 0; j < gaps.comps.length; j++) ((gaps.comps[j] = (gaps.comps[j] as number) / gapTargets), (gaps.ideal[j] = (gaps.ideal[j] as number) / gapTargets));
    talentGaps.push(gaps ?? { names: [], comps: new Float64Array(0), ideal: new Float64Array(0) });
    byCoverage.push(coverage);
    ratios.push(list);
    const sorted = [...list].sort((a, b) => a - b);
    median.push(sorted.length === 0 ? NaN : quantileSorted(sorted, 0.5));
    let found = 0;
    let scored = 0;
    for (const ct of chosen.twins[c] ?? []) {
      const g = view.groups.get(ct.group);
      const p = prepared(ct.group);
      if (!g || !p) continue;
      const row = p.rowOf.get(`${ct.player}|${ct.season}|${ct.level}`);
      if (row === undefined) continue;
      const { rows } = comps(g, row);
      scored++;
      if (rows.some((r) => g.player[r] === ct.twin)) found++;
    }
    twinsFound.push(found);
    twinTargets.push(scored);
  }
  return { median, ratios, twinsFound, twinTargets, byCoverage, talentGaps };
}
