import type { Position } from '../ingest/Roster.ts';
import { DEFAULT_MINIMUMS } from '../profiles/assembleSeasons.ts';
import { isPitcherGroup } from '../profiles/positionGroup.ts';
import { quantileSorted } from '../stats/quantile.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';
import { poolPositions } from './adjacentPositions.ts';
import type { Target } from './Target.ts';
import { valueAt } from './valueAt.ts';

/**
 * How far a default pool reaches from its target. Each rule can be loosened by a request parameter
 * (src/request/parameters.ts), and an explicit pool filter of the same kind replaces it.
 */
export interface PoolReach {
  /** Add the positions next to the target's (ADJACENT_POSITIONS). */
  readonly adjacent: boolean;
  /** Levels either side of the target's level (0: his level only; Infinity: every level). */
  readonly levelSpan: number;
  /** Least playing time of a comp as a share of the target's (0: no floor). See SAMPLE_FLOOR_SHARE. */
  readonly sampleShare: number;
  /** Only the target's season and the n - 1 before it (Infinity: every season). */
  readonly recentSeasons: number;
}

/**
 * The default share of the target's playing time a comp must have (project choice): half. A comp
 * season with half the target's PA (or BF) has a standard error of its rates about 1.4 times the
 * target's (binomial rates: se scales with 1 / sqrt(n)), and keeps the part-time stints, whose rates
 * swing most (a 57-PA season with a .533 BABIP), out of a regular's pool; half rather than all lets a
 * full-time target meet players whose seasons were cut short. With the build's minimum sample
 * (30 PA or BF) as the floor's floor.
 *
 * @example
 * // a 600-PA target: comps with 300 PA or more; a 40-PA target: comps with 30 or more (the build minimum)
 */
export const SAMPLE_FLOOR_SHARE = 0.5;

/** The default reach of comps, match and prospect: his position, levels within one of his, half his playing time. */
export const DEFAULT_REACH: PoolReach = { adjacent: false, levelSpan: 1, sampleShare: SAMPLE_FLOOR_SHARE, recentSeasons: Infinity };

/**
 * The default reach of cheaper comps (project choice): alternatives a club could sign now are at his
 * level and in recent seasons, here his season and the two before it (salaries of older seasons and
 * other levels are not a price for today).
 */
export const CHEAPER_REACH: PoolReach = { ...DEFAULT_REACH, levelSpan: 0, recentSeasons: 3 };

/** The pool rules for one target, as filters (each absent when the reach does not limit it). */
export interface PoolRules {
  readonly positions?: readonly Position[];
  readonly levels?: readonly string[];
  readonly seasonFrom?: number;
  readonly seasonTo?: number;
  /** Least PA (hitters) or BF (pitchers) of a comp season. */
  readonly minSample?: number;
  /** What the floor was scaled to: the target's own playing time (or a typical season for a hand-built profile). */
  readonly sampleFloor?: SampleFloor;
}

export interface SampleFloor {
  readonly unit: 'PA' | 'BF';
  readonly min: number;
  readonly share: number;
  /** The target's PA or BF, or for a hand-built profile the median of the group's seasons (at his level when given). */
  readonly target_sample: number;
  readonly target_sample_from: 'target' | 'group median';
}

/** The build's smallest profiled sample: the floor never goes below what a profile needs anyway. */
const BUILD_MINIMUM = Math.min(DEFAULT_MINIMUMS.minPa, DEFAULT_MINIMUMS.minBf);

/**
 * The default pool rules of a target: his position (and its neighbours with `adjacent`), the levels
 * within `levelSpan` of his (the roster's level order), comp seasons with at least `sampleShare` of his
 * PA or BF (at least the build minimum of 30), and with `recentSeasons` his season and the ones just
 * before it. A hand-built profile has no level unless given (no level rule then) and no playing time:
 * its floor is scaled to the median season of his group (at his level when given).
 *
 * @example
 * // an AA shortstop with 500 PA in 2020, levels A, AA, AAA, top level, DEFAULT_REACH:
 * // { positions: ['SS'], levels: ['A', 'AA', 'AAA'], minSample: 250, ... }
 */
export function poolRules(store: ProfileStore, g: StoredGroup, target: Target, reach: PoolReach): PoolRules {
  const levelIdx = target.level === null ? -1 : store.levels.indexOf(target.level);
  const levels = levelIdx >= 0 && Number.isFinite(reach.levelSpan) ? store.levels.filter((_, i) => Math.abs(i - levelIdx) <= reach.levelSpan) : undefined;
  const lastSeason = target.season ?? maxSeason(g);
  const seasons = Number.isFinite(reach.recentSeasons) && lastSeason !== null ? { seasonFrom: lastSeason - reach.recentSeasons + 1, seasonTo: lastSeason } : {};
  const floor = reach.sampleShare > 0 ? sampleFloor(g, target, levelIdx, reach.sampleShare) : undefined;
  return {
    positions: poolPositions(target.position, reach.adjacent),
    ...(levels ? { levels } : {}),
    ...seasons,
    ...(floor ? { minSample: floor.min, sampleFloor: floor } : {}),
  };
}

function sampleFloor(g: StoredGroup, target: Target, levelIdx: number, share: number): SampleFloor {
  const unit = isPitcherGroup(g.group) ? 'BF' : 'PA';
  let targetSample: number;
  let from: SampleFloor['target_sample_from'] = 'target';
  if (target.row >= 0) targetSample = valueAt(g.sample, target.row);
  else {
    from = 'group median';
    const samples: number[] = [];
    for (let i = 0; i < g.n; i++) if (levelIdx < 0 || g.level[i] === levelIdx) samples.push(valueAt(g.sample, i));
    targetSample = Math.round(quantileSorted(samples.sort((a, b) => a - b), 0.5));
  }
  const min = Number.isFinite(targetSample) ? Math.max(BUILD_MINIMUM, Math.round(share * targetSample)) : BUILD_MINIMUM;
  return { unit, min, share, target_sample: targetSample, target_sample_from: from };
}

function maxSeason(g: StoredGroup): number | null {
  let m: number | null = null;
  for (let i = 0; i < g.n; i++) m = Math.max(m ?? -Infinity, valueAt(g.season, i));
  return m;
}
