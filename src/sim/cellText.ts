/**
 * The text of one stored cell in the canonical CSV format: '' for a missing
 * value (never 0), ids and names for index columns, fixed decimals for
 * measurements, thirds notation for innings, whole dollars for salaries.
 *
 * @example
 * cellText(league, league.pitching, 0, league.pitching.columnIndex('IP')); // => e.g. "112.1"
 */
import type { ColumnTable } from './ColumnTable.ts';
import { formatThirds } from '../text/formatThirds.ts';
import { SIM_POSITIONS } from './simPositions.ts';
import type { SimLeague } from './simTypes.ts';

export function cellText(league: SimLeague, table: ColumnTable, row: number, col: number): string {
  const v = table.get(row, col);
  if (Number.isNaN(v)) return '';
  const spec = table.columns[col];
  if (spec === undefined) return '';
  switch (spec.format) {
    case 'player': return league.players.ids[v] ?? '';
    case 'level': return league.levels[v] ?? '';
    case 'team': return league.teams[v] ?? '';
    case 'pos': return SIM_POSITIONS[v] ?? '';
    case 'int': return String(Math.round(v));
    case 'fixed1': return fixed(v, 1);
    case 'fixed2': return fixed(v, 2);
    case 'thirds': return formatThirds(Math.round(v));
    case 'thousandsUsd': return String(Math.round(v) * 1000);
  }
}

function fixed(v: number, digits: number): string {
  const s = v.toFixed(digits);
  return s.startsWith('-') && Number(s) === 0 ? s.slice(1) : s;
}
