import type { BattingSeason, FieldingSeason } from '../ingest/Roster.ts';

/** A hitter's season at one level: his batting and the fielding row of his primary position (if any). */
export interface HitterLine {
  readonly batting: BattingSeason;
  /** Fielding at the position with the most innings; undefined for a DH. */
  readonly fielding: FieldingSeason | undefined;
}
