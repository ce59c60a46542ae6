import type { ColumnSpec } from './ColumnSpec.ts';

/** levels.csv (optional): one level a row, from lowest to highest. */
export const LEVELS_COLUMNS = [
  { csv: 'level', field: 'level', kind: 'text', required: true },
] as const satisfies readonly ColumnSpec[];
