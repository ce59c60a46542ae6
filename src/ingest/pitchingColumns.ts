import type { AtMostCheck, ColumnSpec } from './ColumnSpec.ts';

/** Balls in play: batters faced less strikeouts, walks and hit batters. */
const BALLS_IN_PLAY = { field: 'BF', minus: ['SO', 'BB', 'HBP'] } as const;

/**
 * pitching.csv: one row per player, season, level and team. Columns in
 * reading order. Counts and outs are summed over a season's stints; fb_mph,
 * fb_spin_rpm and whiff_pct weighted by batters faced, gb_pct by balls in play.
 * Plausible ranges are project choices (common practice: a fastball over
 * 110 mph is a data error, not a talent).
 */
export const PITCHING_COLUMNS = [
  { csv: 'player_id', field: 'playerId', kind: 'player', required: true },
  { csv: 'season', field: 'season', kind: 'season', required: true },
  { csv: 'level', field: 'level', kind: 'level', required: true },
  { csv: 'team', field: 'teams', kind: 'team', required: false },
  { csv: 'G', field: 'G', kind: 'count', required: true, combine: 'sum' },
  { csv: 'GS', field: 'GS', kind: 'count', required: true, combine: 'sum' },
  /** Innings pitched, held in outs (thirds). */
  { csv: 'IP', field: 'outs', kind: 'thirds', required: true, combine: 'sum' },
  { csv: 'BF', field: 'BF', kind: 'count', required: true, combine: 'sum' },
  { csv: 'H', field: 'H', kind: 'count', required: true, combine: 'sum' },
  { csv: 'HR', field: 'HR', kind: 'count', required: true, combine: 'sum' },
  { csv: 'BB', field: 'BB', kind: 'count', required: true, combine: 'sum' },
  { csv: 'HBP', field: 'HBP', kind: 'count', required: true, combine: 'sum' },
  { csv: 'SO', field: 'SO', kind: 'count', required: true, combine: 'sum' },
  { csv: 'ER', field: 'ER', kind: 'count', required: true, combine: 'sum' },
  /** Average fastball velocity, mph. */
  { csv: 'fb_mph', field: 'fbMph', kind: 'measure', required: false,
    range: { min: 60, max: 110, unit: 'mph' }, combine: { mean: 'BF' } },
  /** Average fastball spin rate, rpm. */
  { csv: 'fb_spin_rpm', field: 'fbSpinRpm', kind: 'measure', required: false,
    range: { min: 500, max: 4000, unit: 'rpm' }, combine: { mean: 'BF' } },
  /** Swings and misses per swing, 0 to 100. */
  { csv: 'whiff_pct', field: 'whiffPct', kind: 'percent', required: false, combine: { mean: 'BF' } },
  /** Ground balls per ball in play, 0 to 100. */
  { csv: 'gb_pct', field: 'gbPct', kind: 'percent', required: false, combine: { mean: BALLS_IN_PLAY } },
] as const satisfies readonly ColumnSpec[];

/** Consistency of a pitching row (rules of the game). */
export const PITCHING_CHECKS: readonly AtMostCheck[] = [
  { at: 'GS', sum: ['GS'], atMost: 'G' },
  { at: 'H', sum: ['H'], atMost: 'BF' },
  { at: 'HR', sum: ['HR'], atMost: 'H' },
  { at: 'BF', sum: ['SO', 'BB', 'HBP'], atMost: 'BF' },
];
