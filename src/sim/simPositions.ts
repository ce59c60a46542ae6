/** Positions in the order stored in the tables (`pos` columns and truth rows hold an index into this list). */
import type { Position } from '../ingest/Roster.ts';

export const SIM_POSITIONS: readonly Position[] = ['C', '1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF', 'DH', 'SP', 'RP'];

export function positionIndex(pos: Position): number {
  return SIM_POSITIONS.indexOf(pos);
}
