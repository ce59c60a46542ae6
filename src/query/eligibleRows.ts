import type { PoolFilter } from './PoolFilter.ts';
import type { ProfileStore, StoredGroup, StoredPlayer } from '../store/ProfileStore.ts';

/** What the pool filters read of a store: the level order and the players' hands. */
export interface PoolStore {
  readonly levels: ProfileStore['levels'];
  readonly players: readonly Pick<StoredPlayer, 'bats' | 'throws'>[];
}

/** What the pool filters read of a group's rows. */
export type PoolRows = Pick<StoredGroup, 'n' | 'player' | 'season' | 'level' | 'age' | 'position' | 'sample'>;

/**
 * The pool as a mask over a group's rows: 1 where the row passes every filter and is not one of the
 * excluded players (the target himself). A row with an unknown age fails an age filter; a player with
 * unknown bats or throws fails a bats or throws filter.
 */
export function eligibleRows(
  store: PoolStore,
  g: PoolRows,
  filter: PoolFilter,
  excludePlayers: ReadonlySet<number>,
): { mask: Uint8Array; count: number } {
  const n = g.n;
  const mask = new Uint8Array(n);
  if (isEmptyFilter(filter)) {
    // the common case, a pool of everyone but the target: a fill and the excluded players' rows
    mask.fill(1);
    let count = n;
    const byPlayer = rowsByPlayer(g);
    for (const p of excludePlayers) {
      for (const r of byPlayer.get(p) ?? []) {
        mask[r] = 0;
        count--;
      }
    }
    return { mask, count };
  }
  let count = 0;
  if (filter.levels !== undefined || filter.positions !== undefined) {
    // only the rows at an allowed level and position with enough playing time are tested (about a
    // tenth of the group for a default comps pool), on the other fields: the three hold for every
    // row of the lists taken
    const { levels: _levels, positions: _positions, minSample, ...others } = filter;
    const passes = rowTest(store, g, others, excludePlayers);
    for (const list of bucketsOf(g).select(store, filter)) {
      const { rows } = list;
      const upTo = minSample === undefined ? rows.length : list.atLeast(minSample);
      for (let k = 0; k < upTo; k++) {
        const i = rows[k] as number;
        if (!passes(i)) continue;
        mask[i] = 1;
        count++;
      }
    }
    return { mask, count };
  }
  const passes = rowTest(store, g, filter, excludePlayers);
  for (let i = 0; i < n; i++) {
    if (!passes(i)) continue;
    mask[i] = 1;
    count++;
  }
  return { mask, count };
}

/** The rows of one level and position, most playing time first (ties in row order). */
class RowList {
  readonly rows: Int32Array;
  /** `sample` of each row of `rows`, in the same order (non-increasing). */
  readonly #sample: Float64Array;

  constructor(rows: readonly number[], sample: PoolRows['sample']) {
    const sorted = [...rows].sort((a, b) => (sample[b] ?? 0) - (sample[a] ?? 0) || a - b);
    this.rows = Int32Array.from(sorted);
    this.#sample = Float64Array.from(sorted, (i) => sample[i] ?? 0);
  }

  /** How many of the first rows have a sample of at least `floor` (rowTest's test: `sample >= floor`). */
  atLeast(floor: number): number {
    if (!(floor === floor)) return 0; // a NaN floor keeps no row, as `>= NaN` never holds
    let lo = 0;
    let hi = this.rows.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if ((this.#sample[mid] as number) >= floor) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }
}

/**
 * A group's rows by level and position, each list most playing time first, built once per loaded
 * group, so that a pool filtered by level or position tests only the rows it can hold, and of those
 * only the ones with enough playing time. Why: at 1,000,000 player-seasons a default comps pool
 * (levels within one, the target's position, at least half his playing time) holds about 9% of its
 * group's rows, and testing every row took about 3.5 ms of each answer's 8.
 */
class RowBuckets {
  readonly #keys: readonly { readonly level: number; readonly position: string; readonly list: RowList }[];

  constructor(g: PoolRows) {
    const lists = new Map<string, { level: number; position: string; rows: number[] }>();
    for (let i = 0; i < g.n; i++) {
      const level = g.level[i] ?? -1;
      const position = g.position[i] ?? 'DH';
      const key = `${level}|${position}`;
      let entry = lists.get(key);
      if (!entry) lists.set(key, (entry = { level, position, rows: [] }));
      entry.rows.push(i);
    }
    this.#keys = [...lists.values()].map(({ level, position, rows }) => ({ level, position, list: new RowList(rows, g.sample) }));
  }

  /** The row lists whose level and position the filter allows (every row that can pass it is in one). */
  select(store: PoolStore, filter: PoolFilter): RowList[] {
    const levels = filter.levels === undefined ? null : new Set(filter.levels.map((l) => store.levels.indexOf(l)).filter((at) => at >= 0));
    const positions: ReadonlySet<string> | null = filter.positions ? new Set(filter.positions) : null;
    const out: RowList[] = [];
    for (const { level, position, list } of this.#keys) {
      if (levels !== null && !levels.has(level)) continue;
      if (positions !== null && !positions.has(position)) continue;
      out.push(list);
    }
    return out;
  }
}

const bucketCache = new WeakMap<PoolRows, RowBuckets>();

function bucketsOf(g: PoolRows): RowBuckets {
  let b = bucketCache.get(g);
  if (!b) bucketCache.set(g, (b = new RowBuckets(g)));
  return b;
}

/** Whether any row of the group passes the filter (eligibleRows(...).count > 0, stopping at the first). */
export function hasEligibleRow(store: PoolStore, g: PoolRows, filter: PoolFilter, excludePlayers: ReadonlySet<number>): boolean {
  const passes = isEmptyFilter(filter) ? (i: number): boolean => !excludePlayers.has(g.player[i] ?? -1) : rowTest(store, g, filter, excludePlayers);
  for (let i = 0; i < g.n; i++) if (passes(i)) return true;
  return false;
}

/**
 * The filter as a test of one row. Every field is read once here, not per row, and levels and
 * positions become lookup tables (a filter object's shape varies with the fields it sets, so reading
 * them in the row loop was the slowest part of a query).
 */
function rowTest(store: PoolStore, g: PoolRows, filter: PoolFilter, excludePlayers: ReadonlySet<number>): (row: number) => boolean {
  const { player, season, level, age, position, sample } = g;
  let levelOk: Uint8Array | null = null;
  if (filter.levels) {
    levelOk = new Uint8Array(store.levels.length + 1);
    for (const l of filter.levels) {
      const at = store.levels.indexOf(l);
      if (at >= 0) levelOk[at] = 1;
    }
  }
  const posSet: ReadonlySet<string> | null = filter.positions ? new Set(filter.positions) : null;
  const batsSet: ReadonlySet<string> | null = filter.bats ? new Set(filter.bats) : null;
  const throwsSet: ReadonlySet<string> | null = filter.throws ? new Set(filter.throws) : null;
  const seasonFrom = filter.seasonFrom ?? -Infinity;
  const seasonTo = filter.seasonTo ?? Infinity;
  const ageMin = filter.ageMin;
  const ageMax = filter.ageMax;
  const minSample = filter.minSample;
  const include = filter.include;
  const players = store.players;
  const noExclusions = excludePlayers.size === 0;
  const only = excludePlayers.size === 1 ? [...excludePlayers][0] : undefined;
  return (i) => {
    const p = player[i] ?? -1;
    if (only !== undefined ? p === only : !noExclusions && excludePlayers.has(p)) return false;
    if (levelOk !== null && levelOk[level[i] ?? -1] !== 1) return false;
    const s = season[i] ?? NaN;
    if (s < seasonFrom || s > seasonTo) return false;
    if (ageMin !== undefined && !((age[i] ?? NaN) >= ageMin)) return false;
    if (ageMax !== undefined && !((age[i] ?? NaN) <= ageMax)) return false;
    if (posSet !== null && !posSet.has(position[i] ?? 'DH')) return false;
    if (minSample !== undefined && !((sample[i] ?? 0) >= minSample)) return false;
    if (batsSet !== null || throwsSet !== null) {
      const pl = players[p];
      if (batsSet !== null && !(pl?.bats && batsSet.has(pl.bats))) return false;
      if (throwsSet !== null && !(pl?.throws && throwsSet.has(pl.throws))) return false;
    }
    if (include !== undefined && !include(i)) return false;
    return true;
  };
}

function isEmptyFilter(f: PoolFilter): boolean {
  return (
    f.levels === undefined &&
    f.seasonFrom === undefined &&
    f.seasonTo === undefined &&
    f.ageMin === undefined &&
    f.ageMax === undefined &&
    f.bats === undefined &&
    f.throws === undefined &&
    f.positions === undefined &&
    f.minSample === undefined &&
    f.include === undefined
  );
}

const byPlayerCache = new WeakMap<PoolRows, Map<number, number[]>>();

/** A group's rows per player, built once per loaded group. */
function rowsByPlayer(g: PoolRows): Map<number, number[]> {
  let m = byPlayerCache.get(g);
  if (!m) {
    m = new Map();
    for (let i = 0; i < g.n; i++) {
      const p = g.player[i] as number;
      const list = m.get(p);
      if (list) list.push(i);
      else m.set(p, [i]);
    }
    byPlayerCache.set(g, m);
  }
  return m;
}
