import { valueAt } from '../query/valueAt.ts';
import { QueryError } from '../errors/KindredError.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';

export interface SeasonChoice {
  readonly season?: number;
  readonly level?: string;
}

/**
 * The row of a player in a group to compare with a target: among his rows (narrowed by `season` and
 * `level` when given), the season closest to `reference` (his latest when there is no reference);
 * ties between seasons go to the later one, then to the higher level, then to the larger sample.
 * A player with no such row is a QueryError that lists his profiled seasons in the group.
 */
export function closestSeasonRow(store: ProfileStore, g: StoredGroup, player: number, reference: number | null, choice: SeasonChoice): number {
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
  const gap = (i: number): number => (reference === null ? -season(i) : Math.abs(season(i) - reference));
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
