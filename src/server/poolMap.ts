import { round } from '../stats/round.ts';
import type { StoredGroup, ProfileStore } from '../store/ProfileStore.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';
import { pcaProjection } from './pcaProjection.ts';
import type { PoolMap } from '../request/apiContract.ts';

export type { PoolMap } from '../request/apiContract.ts';

/** Digits kept for the map coordinates (a step of 0.001 z is far below a pixel). */
const MAP_DIGITS = 3;

/**
 * The pool of a position group on its first two principal components (see pcaProjection), computed
 * on the group's z-scores with a missing value taken as 0, the mean of its stratum.
 */
export function poolMap(store: ProfileStore, g: StoredGroup): PoolMap {
  const rows: number[][] = [];
  for (let i = 0; i < g.n; i++) {
    const row: number[] = [];
    for (let j = 0; j < g.d; j++) {
      const v = g.z[i * g.d + j] as number;
      row.push(Number.isNaN(v) ? 0 : v);
    }
    rows.push(row);
  }
  const p = pcaProjection(rows);
  const player_id: string[] = [];
  const name: string[] = [];
  const season: number[] = [];
  const level: string[] = [];
  for (let i = 0; i < g.n; i++) {
    const pl = store.players[g.player[i] as number];
    player_id.push(pl?.playerId ?? '');
    name.push(pl?.name ?? '');
    season.push(g.season[i] as number);
    level.push(store.levels[g.level[i] as number] ?? '');
  }
  return {
    group: g.group,
    n: g.n,
    explained: [round(p.explained[0], 4), round(p.explained[1], 4)],
    x: p.x.map((v) => round(v, MAP_DIGITS)),
    y: p.y.map((v) => round(v, MAP_DIGITS)),
    player_id,
    name,
    season,
    level,
  };
}

