import { valueAt } from './valueAt.ts';
import { QueryError } from '../errors/KindredError.ts';
import type { Position } from '../ingest/Roster.ts';
import { groupOf, type PositionGroup } from '../profiles/positionGroup.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';

export interface TargetRow {
  readonly group: PositionGroup;
  readonly row: number;
}

export interface TargetChoice {
  readonly season?: number;
  readonly level?: string;
  /** Choose among a two-way player's profiles, or a position group. */
  readonly position?: Position;
}

/** Every profile row of a player, across groups (from the players table: only his groups are read). */
export function playerRows(store: ProfileStore, player: number): TargetRow[] {
  return [...store.rowsOf(player)];
}

/**
 * The player-season to answer for: by default his latest season, at the highest level he played
 * that season (the level order of the roster); `season`, `level` and `position` narrow the choice.
 * Between a two-way player's hitter and pitcher profiles the larger sample wins unless a position is given.
 */
export function selectTargetRow(store: ProfileStore, player: number, choice: TargetChoice): TargetRow {
  const all = playerRows(store, player);
  const name = store.players[player]?.name ?? String(player);
  const id = store.players[player]?.playerId ?? '';
  const seasonsOf = (rows: TargetRow[]): string =>
    rows
      .map((r) => {
        const g = store.groups.get(r.group);
        return g ? `${g.season[r.row]} ${store.levels[valueAt(g.level, r.row)]} ${g.position[r.row]}` : '';
      })
      .join(', ');
  if (all.length === 0) {
    throw new QueryError('kindred.query.noSeason', `${id} ${name} has no profiled season (below the minimum sample in every season?)`, { player_id: id });
  }
  let rows = all;
  if (choice.season !== undefined) rows = rows.filter((r) => store.groups.get(r.group)?.season[r.row] === choice.season);
  if (choice.level !== undefined) {
    const li = store.levels.indexOf(choice.level);
    rows = rows.filter((r) => store.groups.get(r.group)?.level[r.row] === li);
  }
  if (choice.position !== undefined) {
    const pos = choice.position;
    const exact = rows.filter((r) => store.groups.get(r.group)?.position[r.row] === pos);
    rows = exact.length > 0 ? exact : rows.filter((r) => r.group === groupOf(pos));
  }
  if (rows.length === 0) {
    const wanted = [choice.season, choice.level, choice.position].filter((x) => x !== undefined).join(' ');
    throw new QueryError('kindred.query.noSeason', `${id} ${name} has no profile for ${wanted}; his profiled seasons: ${seasonsOf(all)}`, {
      player_id: id,
    });
  }
  let best = rows[0] as TargetRow;
  const keyOf = (r: TargetRow): [number, number, number] => {
    const g = store.groups.get(r.group);
    return g ? [valueAt(g.season, r.row), valueAt(g.level, r.row), valueAt(g.sample, r.row)] : [0, 0, 0];
  };
  for (const r of rows) {
    const a = keyOf(r);
    const b = keyOf(best);
    if (a[0] > b[0] || (a[0] === b[0] && (a[1] > b[1] || (a[1] === b[1] && a[2] > b[2])))) best = r;
  }
  return best;
}
