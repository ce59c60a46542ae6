import type { ColumnSpec } from './ColumnSpec.ts';

export const BATS = ['L', 'R', 'S'] as const;
export const THROWS = ['L', 'R'] as const;

/** players.csv: one row per player. */
export const PLAYERS_COLUMNS = [
  { csv: 'player_id', field: 'playerId', kind: 'text', required: true },
  { csv: 'name', field: 'name', kind: 'text', required: true },
  /** YYYY-MM-DD */
  { csv: 'birth_date', field: 'birthDate', kind: 'date', required: false },
  { csv: 'bats', field: 'bats', kind: 'choice', required: false, values: BATS, expected: 'bats L, R or S' },
  { csv: 'throws', field: 'throws', kind: 'choice', required: false, values: THROWS, expected: 'throws L or R' },
] as const satisfies readonly ColumnSpec[];
