/**
 * The contract of the JSON API (and of `--format json`): every answer's type, in one module that the
 * server's endpoints answer with and the page reads. Stable: fields are only ever added, never renamed
 * or removed. The result types of the jobs are declared beside the jobs and named here.
 */
import type { Bats, Position, Throws } from '../ingest/Roster.ts';
import type { DimensionInfo } from '../profiles/Dimension.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';

export type { Comp, CompsResult, DimensionDetail, PoolEcho, QueryEcho } from '../query/CompsResult.ts';
export type { CheaperComp, CheaperResult } from '../jobs/CheaperResult.ts';
export type { MatchCandidate, MatchResult } from '../jobs/MatchResult.ts';
export type { ProspectComp, ProspectResult } from '../jobs/ProspectResult.ts';
export type { DimensionInfo } from '../profiles/Dimension.ts';
/** `GET /api/backtest`: the prospect outlook replayed at past cut seasons (the format of a store's backtest.json). */
export type { BacktestFile as BacktestAnswer } from '../outlook/backtestFile.ts';

/** `GET /api/dims`: the dimensions of each position group (or of one). */
export type DimsAnswer = Partial<Record<PositionGroup, readonly DimensionInfo[]>>;

/** What the page needs to draw its forms (`GET /api/info`, `POST /api/reload`): levels, seasons, group sizes and dimension names, presets. */
export interface StoreInfo {
  readonly generation: number;
  readonly loaded_at: string;
  readonly levels: readonly string[];
  readonly seasons: { readonly from: number | null; readonly to: number | null };
  readonly groups: Readonly<Partial<Record<PositionGroup, { readonly n: number; readonly dims: readonly string[] }>>>;
  readonly presets: readonly string[];
  /** Each job's least coverage by default (the request table's defaults), so that the page shows, and sends, what the server would use. */
  readonly min_coverage: Readonly<Record<'comps' | 'prospect' | 'cheaper' | 'match', number>>;
  /**
   * How far each job's default pool reaches from its target (the request table's defaults of adjacent,
   * level-span, sample-floor and recent), so that the page shows, and sends, what the server would use.
   * Prospect comps have a pool of their own and no entry. null: no limit (any level, any season).
   */
  readonly pool_reach: Readonly<Record<ReachJob, PoolReachDefaults>>;
}

/** The jobs whose pool starts from the target's default reach. */
export type ReachJob = 'comps' | 'cheaper' | 'match';

export interface PoolReachDefaults {
  readonly adjacent: boolean;
  readonly level_span: number | null;
  readonly sample_floor: number;
  readonly recent: number | null;
}

export interface PlayerSeason {
  readonly season: number;
  readonly level: string;
  readonly position: Position;
  readonly group: PositionGroup;
}

/** One suggestion of `GET /api/players`. */
export interface PlayerHit {
  readonly player_id: string;
  readonly name: string;
  readonly birth_date: string | null;
  readonly bats: Bats | null;
  readonly throws: Throws | null;
  /** His profiled player-seasons, latest first. */
  readonly seasons: readonly PlayerSeason[];
}

/** A 2-D map of a position group's pool: one point per player-season, in columns (`GET /api/map`). */
export interface PoolMap {
  readonly group: PositionGroup;
  readonly n: number;
  /** Share of the total variance each of the two axes carries (0 to 1). */
  readonly explained: readonly [number, number];
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly player_id: readonly string[];
  readonly name: readonly string[];
  readonly season: readonly number[];
  readonly level: readonly string[];
}

/**
 * Every refusal: `{error: {code, message}}`, the code stable (`kindred.<area>.<what>`), the message in
 * the API's words (parameters by their plain names, no file paths). `parameter` names the request
 * parameter at fault when there is one, so a page can point at its own field.
 */
export interface ApiErrorBody {
  readonly error: { readonly code: string; readonly message: string; readonly parameter?: string };
}
