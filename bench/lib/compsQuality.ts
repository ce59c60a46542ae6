/**
 * Comp quality on a simulated league, where the simulator knows every player's true talents:
 * for each sampled target, the mean true-talent distance to its top-k comps divided by the mean
 * true-talent distance to the k truly nearest players of the same pool (1.0 is perfect; lower is better).
 * The pool is the target's position group at the target's level, one season per player (his nearest
 * in talent for the reference, his closest profile for the comps), the target's own player excluded.
 * Talents are standardised within the pool so that each counts alike; talents a group's data cannot
 * show are left out (catcher throwing outside catchers; fielding for DH).
 */
import type { SimTruth } from '../../src/sim/SimTruth.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { findCompsWithRows, type CompsOptions } from '../../src/query/findComps.ts';
import { quantileSorted } from '../../src/stats/quantile.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import type { Target } from '../../src/query/Target.ts';
import { QueryError } from '../../src/errors/KindredError.ts';
import type { PositionGroup } from '../../src/profiles/positionGroup.ts';

/** The simulator talents a group's comps are scored on (null: every talent of the kind). */
export const TALENTS_SHOWN: Record<PositionGroup, readonly string[] | null> = {
  C: null,
  IF: ['contact', 'power', 'eye', 'speed', 'glove', 'arm'],
  OF: ['contact', 'power', 'eye', 'speed', 'glove', 'arm'],
  DH: ['contact', 'power', 'eye', 'speed'],
  SP: null,
  RP: null,
};

/** Production talents: the bat for hitters, results for pitchers (what "who hits like him" asks). */
const PRODUCTION_TALENTS: readonly string[] = ['contact', 'power', 'eye', 'stuff', 'control', 'groundball'];

export interface QualityOptions {
  /** `all` (default): every talent the group's data can show; `production`: bat or results talents alone. */
  readonly talents?: 'all' | 'production';
  readonly groups: readonly PositionGroup[];
  readonly level: string;
  readonly targetsPerGroup: number;
  readonly k: number;
  readonly compsOptions: CompsOptions;
  /** Only targets whose sample (PA or BF) lies in this range. */
  readonly sampleRange?: readonly [number, number];
  /**
   * The sample `sampleRange` is read from (default the row's own, `g.sample`): with profiles over windows,
   * the target season's own sample, so that every window is scored on the same targets.
   */
  readonly sampleOf?: (g: StoredGroup, row: number) => number;
  readonly seed: number;
}

export interface QualityResult {
  readonly ratio: number;
  /** Median of the targets' ratios. */
  readonly median: number;
  readonly targets: number;
  readonly perGroup: Readonly<Partial<Record<PositionGroup, number>>>;
}

export function compsQuality(store: ProfileStore, truth: SimTruth, o: QualityOptions): QualityResult {
  let sum = 0;
  let count = 0;
  const all: number[] = [];
  const perGroup: Partial<Record<PositionGroup, number>> = {};
  for (const group of o.groups) {
    const g = store.groups.get(group);
    if (!g) continue;
    const r = groupQuality(store, g, truth, o);
    if (r.targets === 0) continue;
    perGroup[group] = r.sum / r.targets;
    all.push(...r.ratios);
    sum += r.sum;
    count += r.targets;
  }
  all.sort((a, b) => a - b);
  const median = all.length === 0 ? NaN : quantileSorted(all, 0.5);
  return { ratio: count > 0 ? sum / count : NaN, median, targets: count, perGroup };
}

function groupQuality(store: ProfileStore, g: StoredGroup, truth: SimTruth, o: QualityOptions): { sum: number; targets: number; ratios: number[] } {
  const level = store.levels.indexOf(o.level);
  const poolRows: number[] = [];
  for (let i = 0; i < g.n; i++) if (g.level[i] === level) poolRows.push(i);
  if (poolRows.length < 4 * o.k) return { sum: 0, targets: 0, ratios: [] };
  // true talents of the pool, standardised within it
  const first = truthOf(store, g, truth, poolRows[0] as number);
  if (!first) return { sum: 0, targets: 0, ratios: [] };
  const names = truth.talentNames[first.kind];
  const shown = TALENTS_SHOWN[g.group];
  const production = o.talents === 'production';
  const keep = names
    .map((n, i) => ((shown === null || shown.includes(n)) && (!production || PRODUCTION_TALENTS.includes(n)) ? i : -1))
    .filter((i) => i >= 0);
  const t = keep.length;
  const talents = new Float64Array(g.n * t).fill(NaN);
  for (const row of poolRows) {
    const s = truthOf(store, g, truth, row);
    if (!s) continue;
    keep.forEach((k, j) => (talents[row * t + j] = s.talents[k] as number));
  }
  for (let j = 0; j < t; j++) {
    let m = 0;
    let c = 0;
    for (const row of poolRows) if (!Number.isNaN(talents[row * t + j])) (m += talents[row * t + j] as number), c++;
    m /= c;
    let v = 0;
    for (const row of poolRows) if (!Number.isNaN(talents[row * t + j])) v += ((talents[row * t + j] as number) - m) ** 2;
    const sd = Math.sqrt(v / (c - 1)) || 1;
    for (const row of poolRows) talents[row * t + j] = ((talents[row * t + j] as number) - m) / sd;
  }
  const dist = (a: number, b: number): number => {
    let s = 0;
    for (let j = 0; j < t; j++) s += ((talents[a * t + j] as number) - (talents[b * t + j] as number)) ** 2;
    return Math.sqrt(s);
  };
  // deterministic sample of targets
  const next = sampleStream(o.seed);
  const candidates = poolRows.filter((r) => {
    const s = o.sampleOf ? o.sampleOf(g, r) : (g.sample[r] as number);
    return !o.sampleRange || (s >= o.sampleRange[0] && s <= o.sampleRange[1]);
  });
  let sum = 0;
  let targets = 0;
  const ratios: number[] = [];
  const filter = { ...o.compsOptions.filter, levels: [o.level] };
  for (let attempt = 0; attempt < o.targetsPerGroup * 3 && targets < o.targetsPerGroup && candidates.length > 0; attempt++) {
    const row = candidates[Math.floor(next() * candidates.length)] as number;
    if (Number.isNaN(talents[row * t] as number)) continue;
    const target = playerTarget(store, { group: g.group, row });
    const rows = compRowsOrNone(store, target, { ...o.compsOptions, k: o.k, filter });
    if (rows === null || rows.length < o.k) continue;
    const compMean = rows.reduce((a, r) => a + dist(row, r), 0) / rows.length;
    // the k truly nearest other players (each at his nearest season)
    const best = new Map<number, number>();
    for (const r of poolRows) {
      const p = g.player[r] as number;
      if (p === target.player || Number.isNaN(talents[r * t] as number)) continue;
      const d = dist(row, r);
      const prev = best.get(p);
      if (prev === undefined || d < prev) best.set(p, d);
    }
    const nearest = [...best.values()].sort((a, b) => a - b).slice(0, o.k);
    const idealMean = nearest.reduce((a, b) => a + b, 0) / nearest.length;
    if (!(idealMean > 0)) continue;
    sum += compMean / idealMean;
    ratios.push(compMean / idealMean);
    targets++;
  }
  return { sum, targets, ratios };
}

function truthOf(store: ProfileStore, g: StoredGroup, truth: SimTruth, row: number): ReturnType<SimTruth['find']> {
  const id = store.players[g.player[row] as number]?.playerId ?? '';
  return truth.find(id, g.season[row] as number);
}

/** True talents of every row of a group (of the truth season: a window's last), standardised over the group; NaN where unknown. */
/**
 * The comps' rows for a bench target, or null when the season cannot be a target (no value on any
 * weighted dimension: kindred.query.badTarget, common in tiny leagues), so the bench draws another.
 */
export function compRowsOrNone(store: ProfileStore, target: Target, options: CompsOptions): readonly number[] | null {
  try {
    return findCompsWithRows(store, target, options).rows;
  } catch (e) {
    if (e instanceof QueryError && e.code === 'kindred.query.badTarget') return null;
    throw e;
  }
}

export function groupTalents(store: ProfileStore, g: StoredGroup, truth: SimTruth): { talents: Float64Array; t: number; names: readonly string[] } {
  const seasonTruth = (row: number) => truth.find(store.players[g.player[row] as number]?.playerId ?? '', g.season[row] as number);
  let first: ReturnType<typeof seasonTruth>;
  for (let i = 0; i < g.n && !first; i++) first = seasonTruth(i);
  if (!first) return { talents: new Float64Array(0), t: 0, names: [] };
  const shown = TALENTS_SHOWN[g.group];
  const keep = truth.talentNames[first.kind].map((n, i) => (shown === null || shown.includes(n) ? i : -1)).filter((i) => i >= 0);
  const t = keep.length;
  const talents = new Float64Array(g.n * t).fill(NaN);
  for (let r = 0; r < g.n; r++) {
    const s = seasonTruth(r);
    if (s) keep.forEach((k, j) => (talents[r * t + j] = s.talents[k] as number));
  }
  for (let j = 0; j < t; j++) {
    let m = 0;
    let c = 0;
    for (let r = 0; r < g.n; r++) if (!Number.isNaN(talents[r * t + j] as number)) (m += talents[r * t + j] as number), c++;
    m /= c;
    let v = 0;
    for (let r = 0; r < g.n; r++) if (!Number.isNaN(talents[r * t + j] as number)) v += ((talents[r * t + j] as number) - m) ** 2;
    const sd = Math.sqrt(v / (c - 1)) || 1;
    for (let r = 0; r < g.n; r++) talents[r * t + j] = ((talents[r * t + j] as number) - m) / sd;
  }
  return { talents, t, names: keep.map((k) => truth.talentNames[first.kind][k] ?? '') };
}

/**
 * The benches' deterministic stream for sampling targets (xorshift32, Marsaglia 2003), uniform in
 * [0, 1). Kept apart from src/random/SeededRandom so that the benches' published figures keep their
 * targets.
 */
export function sampleStream(seed: number): () => number {
  let state = seed >>> 0 || 1;
  return () => {
    state ^= state << 13;
    state >>>= 0;
    state ^= state >>> 17;
    state ^= state << 5;
    state >>>= 0;
    return state / 2 ** 32;
  };
}
