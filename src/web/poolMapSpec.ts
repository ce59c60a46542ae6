import type { TopLevelSpec } from 'vega-lite';
import type { PoolMap } from '../request/apiContract.ts';
import { PALETTE } from './palette.ts';

export interface MapPoint {
  readonly x: number;
  readonly y: number;
  readonly name: string;
  readonly season: number;
  readonly level: string;
  /** `pool`, `comp` or `target`. */
  readonly role: string;
  readonly rank: number | null;
}

export interface Highlight {
  readonly playerId: string;
  readonly season: number;
  readonly level: string;
  readonly role: 'comp' | 'target';
  readonly rank: number | null;
}

/** The map's points with the target and the comps marked (a row is player, season and level). */
export function mapPoints(map: PoolMap, highlights: readonly Highlight[]): MapPoint[] {
  const key = (id: string, season: number, level: string): string => `${id}|${season}|${level}`;
  const marked = new Map(highlights.map((h) => [key(h.playerId, h.season, h.level), h]));
  const points: MapPoint[] = [];
  for (let i = 0; i < map.n; i++) {
    const h = marked.get(key(map.player_id[i] ?? '', map.season[i] ?? 0, map.level[i] ?? ''));
    points.push({
      x: map.x[i] ?? 0,
      y: map.y[i] ?? 0,
      name: map.name[i] ?? '',
      season: map.season[i] ?? 0,
      level: map.level[i] ?? '',
      role: h?.role ?? 'pool',
      rank: h?.rank ?? null,
    });
  }
  return points;
}

/**
 * The pool on its first two principal components: every player-season a small grey dot, the comps
 * orange diamonds with their rank, the target a large blue circle. Axis titles give the share of
 * variance each axis carries.
 */
export function poolMapSpec(map: PoolMap, highlights: readonly Highlight[]): TopLevelSpec {
  const points = mapPoints(map, highlights);
  const pct = (v: number): string => `${(100 * v).toFixed(0)}%`;
  const x = { field: 'x', type: 'quantitative' as const, title: `first component (${pct(map.explained[0])} of variance)`, axis: { grid: false } };
  const y = { field: 'y', type: 'quantitative' as const, title: `second component (${pct(map.explained[1])})`, axis: { grid: false } };
  const tooltip = [{ field: 'name' }, { field: 'season' }, { field: 'level' }, { field: 'role' }];
  return {
    width: 380,
    height: 300,
    data: { values: points },
    config: { view: { stroke: '#DDDDDD' }, axis: { labelFontSize: 10, titleFontSize: 11 } },
    layer: [
      {
        transform: [{ filter: "datum.role == 'pool'" }],
        mark: { type: 'circle', size: 9, color: PALETTE.pool, opacity: 0.35 },
        encoding: { x, y, tooltip },
      },
      {
        transform: [{ filter: "datum.role == 'comp'" }],
        mark: { type: 'point', shape: 'diamond', filled: true, size: 90, color: PALETTE.comp, stroke: PALETTE.ink, strokeWidth: 0.6 },
        encoding: { x, y, tooltip: [...tooltip, { field: 'rank' }] },
      },
      {
        transform: [{ filter: "datum.role == 'comp'" }],
        mark: { type: 'text', dx: 8, dy: -6, fontSize: 10, color: PALETTE.ink },
        encoding: { x, y, text: { field: 'rank' } },
      },
      {
        transform: [{ filter: "datum.role == 'target'" }],
        mark: { type: 'circle', size: 160, color: PALETTE.target, stroke: '#FFFFFF', strokeWidth: 1.5, opacity: 1 },
        encoding: { x, y, tooltip },
      },
    ],
  };
}
