import type { Bats, Position, Throws } from '../ingest/Roster.ts';

/** Which player-seasons may be comps. Every field is optional: absent means no restriction. */
export interface PoolFilter {
  readonly levels?: readonly string[];
  readonly seasonFrom?: number;
  readonly seasonTo?: number;
  readonly ageMin?: number;
  readonly ageMax?: number;
  readonly bats?: readonly Bats[];
  readonly throws?: readonly Throws[];
  readonly positions?: readonly Position[];
  /** Least playing time of a comp season: PA for hitters, BF for pitchers (the group's `sample`). */
  readonly minSample?: number;
  /**
   * Any further restriction, row by row (earlier seasons only, a known salary under a limit...).
   * Receives the row index in the target's position group. Not echoed in JSON: callers describe it.
   */
  readonly include?: (row: number) => boolean;
}
