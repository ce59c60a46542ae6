import type { AtMostCheck, ColumnSpec } from './ColumnSpec.ts';

/** Fielding positions profiled by Kindred. */
export const FIELD_POSITIONS = ['C', '1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF'] as const;

/**
 * fielding.csv: one row per player, season, level, team and position.
 * Columns in reading order. Rows at P are checked like the others, then left
 * out (pitchers' fielding is not profiled). Counts and outs are summed over a
 * season's stints; arm_mph weighted by innings (outs), pop_2b_s and
 * exchange_s by sb_against (by innings when a stint with the value lacks it).
 * Plausible ranges are project choices (common practice: a pop time under
 * 1.5 s is a data error, not a talent).
 */
export const FIELDING_COLUMNS = [
  { csv: 'player_id', field: 'playerId', kind: 'player', required: true },
  { csv: 'season', field: 'season', kind: 'season', required: true },
  { csv: 'level', field: 'level', kind: 'level', required: true },
  { csv: 'team', field: 'teams', kind: 'team', required: false },
  { csv: 'pos', field: 'pos', kind: 'choice', required: true, values: FIELD_POSITIONS, skipped: ['P'],
    expected: 'a position: C, 1B, 2B, 3B, SS, LF, CF, RF (or P, read and skipped)' },
  { csv: 'G', field: 'G', kind: 'count', required: false, combine: 'sum' },
  /** Innings in the field, held in outs (thirds): 6.2 innings is 20 outs. */
  { csv: 'inn', field: 'outs', kind: 'thirds', required: true, combine: 'sum' },
  { csv: 'PO', field: 'PO', kind: 'count', required: true, combine: 'sum' },
  { csv: 'A', field: 'A', kind: 'count', required: true, combine: 'sum' },
  { csv: 'E', field: 'E', kind: 'count', required: true, combine: 'sum' },
  /** Fielder's throwing velocity, mph. */
  { csv: 'arm_mph', field: 'armMph', kind: 'measure', required: false,
    range: { min: 40, max: 110, unit: 'mph' }, combine: { mean: 'outs' } },
  /** Catcher's pop time to second base, seconds. */
  { csv: 'pop_2b_s', field: 'pop2bS', kind: 'measure', required: false,
    range: { min: 1.5, max: 3.0, unit: 's' }, combine: { mean: 'sbAgainst', fallback: 'outs' } },
  /** Catcher's exchange (glove to release), seconds. */
  { csv: 'exchange_s', field: 'exchangeS', kind: 'measure', required: false,
    range: { min: 0.4, max: 1.5, unit: 's' }, combine: { mean: 'sbAgainst', fallback: 'outs' } },
  { csv: 'sb_against', field: 'sbAgainst', kind: 'count', required: false, combine: 'sum' },
  { csv: 'cs_caught', field: 'csCaught', kind: 'count', required: false, combine: 'sum' },
] as const satisfies readonly ColumnSpec[];

/** Consistency of a fielding row: runners caught stealing are among the attempts. */
export const FIELDING_CHECKS: readonly AtMostCheck[] = [
  { at: 'cs_caught', sum: ['cs_caught'], atMost: 'sb_against' },
];
