import type { ColumnSpec } from './ColumnSpec.ts';

/** levels.csv (required): one level a row, from lowest to highest; the last is the top level. */
export const LEVELS_COLUMNS = [
  { csv: 'level', field: 'level', kind: 'text', required: true },
] as const satisfies readonly ColumnSpec[];
