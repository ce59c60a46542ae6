import type { Position } from '../ingest/Roster.ts';

/**
 * The positions next to each position, the one place this is defined (project choice, in the spirit
 * of the common-practice defensive spectrum): around the infield 3B, SS, 2B, 1B are neighbours in
 * that order and the two corners (1B, 3B) are neighbours too (corner infield); the three outfield
 * positions are all neighbours of each other; C, DH, SP and RP have none (a catcher's pool is
 * catchers; starters and relievers are separate position groups).
 *
 * @example
 * ADJACENT_POSITIONS.SS; // => ['2B', '3B']
 */
export const ADJACENT_POSITIONS: Readonly<Record<Position, readonly Position[]>> = {
  C: [],
  '1B': ['2B', '3B'],
  '2B': ['SS', '1B'],
  SS: ['2B', '3B'],
  '3B': ['SS', '1B'],
  LF: ['CF', 'RF'],
  CF: ['LF', 'RF'],
  RF: ['CF', 'LF'],
  DH: [],
  SP: [],
  RP: [],
};

/**
 * The positions of a pool for a target at `position`: his own, and with `adjacent` the positions next
 * to it (ADJACENT_POSITIONS).
 *
 * @example
 * poolPositions('SS', true); // => ['SS', '2B', '3B']
 * poolPositions('SS', false); // => ['SS']
 */
export function poolPositions(position: Position, adjacent: boolean): Position[] {
  return adjacent ? [position, ...ADJACENT_POSITIONS[position]] : [position];
}
