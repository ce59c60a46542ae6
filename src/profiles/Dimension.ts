import type { PositionGroup } from './positionGroup.ts';
import type { SkillFamily } from './skillFamily.ts';
import type { Direction } from '../stats/Direction.ts';

/**
 * How a dimension turns a season line into a number.
 * - `rate`: numerator / denominator (OBP, K%); regressed toward the league rate by adding
 *   `stabilisation` league-average events to the denominator.
 * - `mean`: an average measured over `events` (exit velocity over batted-ball events); regressed the same
 *   way when `stabilisation` > 0, not regressed when it is 0 (a timed measurement such as pop time).
 * - `derived`: computed from the other regressed values of the same line (FIP from regressed K, BB, HR rates).
 */
export type Measure<L> =
  | {
      readonly kind: 'rate';
      readonly numerator: (line: L) => number | undefined;
      readonly denominator: (line: L) => number | undefined;
      /** League-average events added before dividing (0 = not regressed); the fallback when k is fitted. */
      readonly stabilisation: number;
      /**
       * Each event of the denominator is a success or not (K%, OBP, BABIP): the rate is binomial, so its k
       * can be fitted to the roster (src/stats/betaBinomialMoments.ts). False for TB / AB, range factor.
       */
      readonly binomial: boolean;
    }
  | {
      readonly kind: 'mean';
      readonly value: (line: L) => number | undefined;
      readonly events: (line: L) => number | undefined;
      readonly stabilisation: number;
    }
  | {
      readonly kind: 'derived';
      /** Raw (observed) value from the line alone. */
      readonly raw: (line: L, league: LeagueContext) => number | undefined;
      /** Regressed value from the line's regressed inputs (the map is only valid during the call: it is refilled for the next line). */
      readonly regressed: (line: L, regressed: ReadonlyMap<string, number>, league: LeagueContext) => number | undefined;
    };

/** League figures a derived dimension may need (per season and level). */
export interface LeagueContext {
  /** FIP constant of the season and level (league ERA minus league raw FIP). */
  readonly fipConstant: number;
}

/** Where league means and standardisation are taken: per position group, or per exact fielding position. */
export type StratumScope = 'group' | 'position';

export interface Dimension<L> {
  /** Stable machine name used in options, JSON and the store (snake_case). */
  readonly name: string;
  readonly label: string;
  readonly unit: string;
  readonly direction: Direction;
  /** One sentence an analyst understands. */
  readonly meaning: string;
  /** Where the formula comes from (module and source). */
  readonly source: string;
  /** Skill the dimension mostly measures: used to describe redundancy, not in the maths. */
  readonly skill: string;
  /** Skill family whose share of the default weight this dimension draws on (see skillFamily.ts). */
  readonly family: SkillFamily;
  readonly groups: readonly PositionGroup[];
  readonly scope: StratumScope;
  /** Digits to print in natural units (3 for OBP, 1 for mph). */
  readonly digits: number;
  readonly measure: Measure<L>;
}

/** What every consumer of a store needs to know about a dimension (no functions; serialisable). */
export interface DimensionInfo {
  readonly name: string;
  readonly label: string;
  readonly unit: string;
  readonly direction: Direction;
  readonly meaning: string;
  readonly source: string;
  readonly skill: string;
  readonly family: SkillFamily;
  readonly scope: StratumScope;
  readonly digits: number;
  /** Stabilisation sample in events (0 when not regressed or derived). */
  readonly stabilisation: number;
}

export function describeDimension<L>(dim: Dimension<L>): DimensionInfo {
  const m = dim.measure;
  return {
    name: dim.name,
    label: dim.label,
    unit: dim.unit,
    direction: dim.direction,
    meaning: dim.meaning,
    source: dim.source,
    skill: dim.skill,
    family: dim.family,
    scope: dim.scope,
    digits: dim.digits,
    stabilisation: m.kind === 'derived' ? 0 : m.stabilisation,
  };
}
