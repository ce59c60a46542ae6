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
  const mask = new Uint8Array(g.n);
  if (isEmptyFilter(filter)) {
    // the common case, a pool of everyone but the target: a fill and the excluded players' rows
    mask.fill(1);
    let count = g.n;
    const byPlayer = rowsByPlayer(g);
    for (const p of excludePlayers) {
      for (const r of byPlayer.get(p) ?? []) {
        mask[r] = 0;
        count--;
      }
    }
    return { mask, count };
  }
  const levelSet = filter.levels ? new Set(filter.levels.map((l) => store.levels.indexOf(l))) : null;
  const posSet = filter.positions ? new Set(filter.positions) : null;
  const batsSet = filter.bats ? new Set(filter.bats) : null;
  const throwsSet = filter.throws ? new Set(filter.throws) : null;
  let count = 0;
  for (let i = 0; i < g.n; i++) {
    const p = g.player[i] as number;
    if (excludePlayers.has(p)) continue;
    if (levelSet && !levelSet.has(g.level[i] as number)) continue;
    const season = g.season[i] as number;
    if (filter.seasonFrom !== undefined && season < filter.seasonFrom) continue;
    if (filter.seasonTo !== undefined && season > filter.seasonTo) continue;
    const age = g.age[i] as number;
    if (filter.ageMin !== undefined && !(age >= filter.ageMin)) continue;
    if (filter.ageMax !== undefined && !(age <= filter.ageMax)) continue;
    if (posSet && !posSet.has(g.position[i] ?? 'DH')) continue;
    if (filter.minSample !== undefined && !((g.sample[i] ?? 0) >= filter.minSample)) continue;
    if (batsSet || throwsSet) {
      const pl = store.players[p];
      if (batsSet && !(pl?.bats && batsSet.has(pl.bats))) continue;
      if (throwsSet && !(pl?.throws && throwsSet.has(pl.throws))) continue;
    }
    if (filter.include && !filter.include(i)) continue;
    mask[i] = 1;
    count++;
  }
  return { mask, count };
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
