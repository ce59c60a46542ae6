import type { StoredGroup } from '../store/ProfileStore.ts';
import type { ScoredRow } from './scoreRow.ts';
import { valueAt } from './valueAt.ts';

/** The columns ranking reads: each row's player and season. */
export type RowColumns = Pick<StoredGroup, 'player' | 'season'>;

export interface RankSettings {
  /** Comps wanted (Infinity: all). */
  readonly k: number;
  /** Keep several seasons of one player (default: each player once, at his closest season). */
  readonly allSeasons: boolean;
  /** Rows sharing less of the target's weight are left out (0 to 1). */
  readonly minCoverage: number;
}

/** Closer first; between equal distances the later season. */
export function closerFirst(g: RowColumns): (a: ScoredRow, b: ScoredRow) => number {
  return (a, b) => a.d2 - b.d2 || valueAt(g.season, b.row) - valueAt(g.season, a.row);
}

/**
 * The k closest scored rows (closerFirst), leaving out rows under the coverage floor or at no finite
 * distance, each player once (his closest season) unless `allSeasons`. Any extra fields of the
 * scored rows are kept.
 *
 * @example
 * // rows of players 1, 1, 2 at d2 4, 1, 2; k 2: player 1's second row (1), then player 2's (2)
 */
export function rankScored<S extends ScoredRow>(g: RowColumns, scored: Iterable<S>, settings: RankSettings): S[] {
  const before = closerFirst(g);
  const kept: S[] = [];
  const bestOf = new Map<number, number>();
  for (const s of scored) {
    if (!(s.coverage >= settings.minCoverage) || !Number.isFinite(s.d2)) continue;
    if (settings.allSeasons) {
      kept.push(s);
      continue;
    }
    const player = valueAt(g.player, s.row);
    const at = bestOf.get(player);
    if (at === undefined) {
      bestOf.set(player, kept.length);
      kept.push(s);
    } else if (before(s, kept[at] ?? s) < 0) kept[at] = s;
  }
  return topK(kept, settings.k, before);
}

/**
 * The k first items in the given order, without sorting them all: the k-th smallest distance (a native
 * numeric sort of the distances) bounds the few that need the full comparison.
 */
function topK<S extends ScoredRow>(items: S[], k: number, order: (a: S, b: S) => number): S[] {
  if (items.length > 4 * k) {
    const d = Float64Array.from(items, (s) => s.d2).sort();
    const bound = valueAt(d, k - 1);
    items = items.filter((s) => s.d2 <= bound);
  }
  return items.sort(order).slice(0, k);
}
