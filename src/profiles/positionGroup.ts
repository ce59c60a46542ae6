import type { Position } from '../ingest/Roster.ts';

/**
 * Position groups: each has its own dimension set, its own standardisation strata and its own index.
 * Infielders and outfielders are grouped so that a shortstop can be compared with a second baseman;
 * their fielding dimensions are still standardised within the exact position.
 */
export const POSITION_GROUPS = ['C', 'IF', 'OF', 'DH', 'SP', 'RP'] as const;
export type PositionGroup = (typeof POSITION_GROUPS)[number];

export const POSITIONS: readonly Position[] = ['C', '1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF', 'DH', 'SP', 'RP'];

export function groupOf(position: Position): PositionGroup {
  switch (position) {
    case 'C':
      return 'C';
    case '1B':
    case '2B':
    case '3B':
    case 'SS':
      return 'IF';
    case 'LF':
    case 'CF':
    case 'RF':
      return 'OF';
    case 'DH':
      return 'DH';
    case 'SP':
      return 'SP';
    case 'RP':
      return 'RP';
  }
}

export function isPosition(text: string): text is Position {
  return (POSITIONS as readonly string[]).includes(text);
}

export function isPitcherGroup(group: PositionGroup): boolean {
  return group === 'SP' || group === 'RP';
}
