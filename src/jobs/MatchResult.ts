/** The JSON contract of `kindred match --format json`; extends the comps contract and only ever gains fields. */
import type { Comp, PoolEcho, QueryEcho } from '../query/CompsResult.ts';

export interface MatchCandidate extends Comp {
  /** Share of the pool's players (one row each, his closest) less alike to the target, 0 to 100 (null for an empty pool). */
  readonly percentile: number | null;
  /** Pool players (other than the candidate) compared. */
  readonly pool_players: number;
  readonly more_alike: number;
  readonly less_alike: number;
  /** The candidate's season passes the pool filters. */
  readonly in_pool: boolean;
}

export interface MatchResult {
  readonly query: QueryEcho;
  readonly pool: PoolEcho;
  readonly candidate: MatchCandidate;
  /** The closest player in the pool, for reference (null when the pool is empty). */
  readonly closest: Comp | null;
}