import { valueAt } from '../query/valueAt.ts';
import { QueryError } from '../errors/KindredError.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';

export interface SeasonChoice {
  readonly season?: number;
  readonly level?: string;
}

/**
 * The row of a player in a group to compare with a target: among his rows (narrowed by `season` and
 * `level` when given, so the seasons asked are the ones compared), the one most alike the target,
 * i.e. with the smallest `distance2` (a season that shares no weighted dimension, at an infinite
 * distance, comes last); ties go to the later season, then to the higher level, then to the larger
 * sample. Not the season closest in the calendar: a candidate is judged at his best match, as comps
 * are. A player with no such row is a QueryError that lists his profiled seasons in the group.
 *
 * @example
 * // rows of the candidate in 2019 (d2 9), 2021 (d2 2), 2022 (d2 5), target in 2022: the 2021 row
 */
export function mostAlikeRow(store: ProfileStore, g: StoredGroup, player: number, choice: SeasonChoice, distance2: (row: number) => number): number {
  const all: number[] = [];
  for (let i = 0; i < g.n; i++) if (g.player[i] === player) all.push(i);
  const levelIdx = choice.level !== undefined ? store.levels.indexOf(choice.level) : -1;
  const rows = all.filter((i) => (choice.season === undefined || g.season[i] === choice.season) && (choice.level === undefined || g.level[i] === levelIdx));
  const p = store.players[player];
  if (rows.length === 0) {
    const seasons = all.map((i) => `${g.season[i]} ${store.levels[valueAt(g.level, i)]} ${g.position[i]}`).join(', ');
    const wanted = [choice.season, choice.level].filter((x) => x !== undefined).join(' ');
    throw new QueryError(
      'kindred.query.noSeason',
      `${p?.playerId ?? ''} ${p?.name ?? ''} has no ${g.group} profile${wanted ? ` for ${wanted}` : ''}${seasons ? `; his ${g.group} seasons: ${seasons}` : ' (he is compared within the target\u2019s position group)'}`,
      { player_id: p?.playerId ?? '' },
    );
  }
  const season = (i: number): number => valueAt(g.season, i);
  const level = (i: number): number => valueAt(g.level, i);
  const d2 = new Map(rows.map((i) => [i, Number.isFinite(distance2(i)) ? distance2(i) : Infinity]));
  const gap = (i: number): number => d2.get(i) ?? Infinity;
  let best = valueAt(rows, 0);
  for (const i of rows) {
    const better =
      gap(i) < gap(best) ||
      (gap(i) === gap(best) &&
        (season(i) > season(best) ||
          (season(i) === season(best) && (level(i) > level(best) || (level(i) === level(best) && valueAt(g.sample, i) > valueAt(g.sample, best))))));
    if (better) best = i;
  }
  return best;
}
