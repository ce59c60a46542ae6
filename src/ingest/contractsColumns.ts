import type { ColumnSpec } from './ColumnSpec.ts';

/** contracts.csv (optional): one row per player and season. */
export const CONTRACTS_COLUMNS = [
  { csv: 'player_id', field: 'playerId', kind: 'player', required: true },
  { csv: 'season', field: 'season', kind: 'season', required: true },
  { csv: 'salary_usd', field: 'salaryUsd', kind: 'money', required: true, expected: 'a salary in USD' },
] as const satisfies readonly ColumnSpec[];
