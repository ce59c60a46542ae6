/** The JSON contract of `kindred cheaper --format json`; extends the comps contract and only ever gains fields. */
import type { Comp, PoolEcho, QueryEcho } from '../query/CompsResult.ts';

export interface CheaperComp extends Comp {
  readonly salary_usd: number;
  /** Likeness per million USD of salary (rewards the minimum salary alone: read value_score instead). */
  readonly likeness_per_million: number;
  /** 0 to 100: likeness beyond chance times the share of the reference salary saved (src/jobs/valueScore.ts); null without a salary. */
  readonly value_score: number | null;
  /** Likeness above the unrelated floor (pool.salary.likeness_floor); only these can be on the frontier. */
  readonly above_likeness_floor: boolean;
  /** On the value frontier: above the likeness floor, and no listed comp above the floor ranked above him (more alike) is paid as little or less. */
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
    /** Comps at or below this likeness (two unrelated players, 100 / e) are never on the frontier. */
    readonly likeness_floor: number;
    /** The salary the value score measures savings against: the target's, else the limit. */
    readonly value_reference_usd: number;
  };
}

export interface CheaperResult {
  readonly query: QueryEcho;
  readonly pool: CheaperPoolEcho;
  readonly comps: readonly CheaperComp[];
}