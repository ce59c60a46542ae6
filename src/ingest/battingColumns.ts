import type { AtMostCheck, ColumnSpec } from './ColumnSpec.ts';

/**
 * batting.csv: one row per player, season, level and team. Columns in
 * reading order. Counts are summed over a season's stints; the batted-ball
 * averages are weighted by bbe (by PA when a stint with the value lacks bbe),
 * the run speed by PA.
 *
 * Plausible ranges are project choices, not published limits: bounds of
 * physical plausibility for a professional player (common practice: an
 * average exit velocity over 120 mph is a data error, not a talent).
 */
export const BATTING_COLUMNS = [
  { csv: 'player_id', field: 'playerId', kind: 'player', required: true },
  { csv: 'season', field: 'season', kind: 'season', required: true },
  { csv: 'level', field: 'level', kind: 'level', required: true },
  { csv: 'team', field: 'teams', kind: 'team', required: false },
  { csv: 'G', field: 'G', kind: 'count', required: false, combine: 'sum' },
  { csv: 'PA', field: 'PA', kind: 'count', required: true, combine: 'sum' },
  { csv: 'AB', field: 'AB', kind: 'count', required: true, combine: 'sum' },
  { csv: 'H', field: 'H', kind: 'count', required: true, combine: 'sum' },
  { csv: '2B', field: 'doubles', kind: 'count', required: true, combine: 'sum' },
  { csv: '3B', field: 'triples', kind: 'count', required: true, combine: 'sum' },
  { csv: 'HR', field: 'HR', kind: 'count', required: true, combine: 'sum' },
  { csv: 'BB', field: 'BB', kind: 'count', required: true, combine: 'sum' },
  { csv: 'HBP', field: 'HBP', kind: 'count', required: true, combine: 'sum' },
  { csv: 'SF', field: 'SF', kind: 'count', required: true, combine: 'sum' },
  { csv: 'SO', field: 'SO', kind: 'count', required: true, combine: 'sum' },
  { csv: 'IBB', field: 'IBB', kind: 'count', required: false, combine: 'sum' },
  { csv: 'SB', field: 'SB', kind: 'count', required: false, combine: 'sum' },
  { csv: 'CS', field: 'CS', kind: 'count', required: false, combine: 'sum' },
  /** Batted-ball events behind the batted-ball averages. */
  { csv: 'bbe', field: 'bbe', kind: 'count', required: false, combine: 'sum' },
  /** Average exit velocity, mph. */
  { csv: 'ev_avg_mph', field: 'evAvgMph', kind: 'measure', required: false,
    range: { min: 40, max: 120, unit: 'mph' }, combine: { mean: 'bbe', fallback: 'PA' } },
  /** 90th percentile exit velocity, mph (also checked to be >= ev_avg_mph). */
  { csv: 'ev_p90_mph', field: 'evP90Mph', kind: 'measure', required: false,
    range: { min: 40, max: 125, unit: 'mph' }, combine: { mean: 'bbe', fallback: 'PA' } },
  /** Average launch angle, degrees. */
  { csv: 'la_avg_deg', field: 'laAvgDeg', kind: 'measure', required: false,
    range: { min: -90, max: 90, unit: 'deg' }, combine: { mean: 'bbe', fallback: 'PA' } },
  /** Share of batted balls hit hard, 0 to 100. */
  { csv: 'hard_hit_pct', field: 'hardHitPct', kind: 'percent', required: false, combine: { mean: 'bbe', fallback: 'PA' } },
  /** Share of batted balls in the productive launch-angle band, 0 to 100 (formerly sweet_spot_pct). */
  { csv: 'la_band_pct', field: 'laBandPct', kind: 'percent', required: false, combine: { mean: 'bbe', fallback: 'PA' },
    formerly: ['sweet_spot_pct'] },
  /** Top running speed, feet per second (formerly sprint_ft_s). */
  { csv: 'run_speed_ft_s', field: 'runSpeedFtS', kind: 'measure', required: false,
    range: { min: 15, max: 35, unit: 'ft/s' }, combine: { mean: 'PA' }, formerly: ['sprint_ft_s'] },
] as const satisfies readonly ColumnSpec[];

/** Consistency of a batting row (rules of the game: a hit is an at bat, a plate appearance is one of AB, BB, HBP, SF, ...). */
export const BATTING_CHECKS: readonly AtMostCheck[] = [
  { at: 'H', sum: ['H'], atMost: 'AB' },
  { at: 'H', sum: ['2B', '3B', 'HR'], atMost: 'H' },
  { at: 'PA', sum: ['AB', 'BB', 'HBP', 'SF'], atMost: 'PA' },
  { at: 'SO', sum: ['SO'], atMost: 'PA' },
  { at: 'IBB', sum: ['IBB'], atMost: 'BB' },
  { at: 'bbe', sum: ['bbe'], atMost: 'PA' },
  { at: 'ev_p90_mph', sum: ['ev_avg_mph'], atMost: 'ev_p90_mph' },
];
