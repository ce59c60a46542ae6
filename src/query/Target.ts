import type { Position } from '../ingest/Roster.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';

/** What comps are sought for: an existing player-season or a hand-built profile. */
export interface Target {
  readonly kind: 'player' | 'want';
  readonly group: PositionGroup;
  readonly position: Position;
  /** Player index in the store, or -1 for a hand-built profile. */
  readonly player: number;
  /** Row in the group, or -1 for a hand-built profile. */
  readonly row: number;
  readonly season: number | null;
  readonly level: string | null;
  readonly age: number | null;
  /** Standardised values, NaN where the target has no value. */
  readonly z: Float64Array;
  /** Natural-unit values, NaN where the target has no value. */
  readonly raw: Float64Array;
}
