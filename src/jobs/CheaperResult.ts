/** The JSON contract of `kindred cheaper --format json`; extends the comps contract and only ever gains fields. */
import type { Comp, PoolEcho, QueryEcho } from '../query/CompsResult.ts';

export interface CheaperComp extends Comp {
  readonly salary_usd: number;
  /** Likeness per million USD of salary. */
  readonly likeness_per_million: number;
  /** On the value frontier: no listed comp ranked above him (more alike) is paid as little or less. */
  readonly frontier: boolean;
}

export interface CheaperPoolEcho extends PoolEcho {
  readonly salary: {
    readonly rule: 'max-salary' | 'max-share';
    readonly limit_usd: number;
    /** The --max-share given (null with --max-salary). */
    readonly share: number | null;
    /** The target's salary in his season (null when unknown). */
    readonly target_salary_usd: number | null;
    /** Eligible player-seasons with a known salary under the limit. */
    readonly under_limit: number;
    /** Left out: a known salary above the limit. */
    readonly over_limit: number;
    /** Left out: no salary known (contracts.csv has no row for the player and season). */
    readonly without_salary: number;
    /** Distinct players among those without a salary. */
    readonly without_salary_players: number;
  };
}

export interface CheaperResult {
  readonly query: QueryEcho;
  readonly pool: CheaperPoolEcho;
  readonly comps: readonly CheaperComp[];
}