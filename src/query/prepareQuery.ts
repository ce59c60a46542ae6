import { QueryError } from '../errors/KindredError.ts';
import { eligibleRows } from './eligibleRows.ts';
import { targetWeight, type MissingRule } from './missingAwareDistance.ts';
import type { PoolFilter } from './PoolFilter.ts';
import type { SampleFloor } from './poolDefaults.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';
import { storedGroup } from './storedGroup.ts';
import type { Target } from './Target.ts';
import { userWeights, type WeightPreset } from './weightPresets.ts';
import { missingRuleOf } from './missingRuleOf.ts';
import { coreImputerOf } from './coreImputerOf.ts';

/** What decides a query's pool and weights (the part of CompsOptions every job shares). */
export interface QuerySettings {
  readonly filter: PoolFilter;
  readonly preset: WeightPreset;
  readonly weightOverrides: ReadonlyMap<string, number>;
  /** `redundancy` (default) weighs down dimensions that repeat a skill; `plain` gives every dimension 1. */
  readonly weighting: 'redundancy' | 'plain';
  /** How the filter's playing-time floor was scaled (poolRules), for the echo; absent without a floor from the rules. */
  readonly sampleFloor?: SampleFloor;
  /**
   * A dimension the target has and a pool row lacks: left out and the rest rescaled (`rescale`), counted at its
   * expected gap (`expected`) or at its expected gap given the row's core dimensions (`{ impute }`, or `impute`
   * for the lines of the queried group, coreImputerOf; MissingRule); default missingRuleOf(group).
   */
  readonly missing?: MissingRule | 'impute';
}

/** A query made ready: its group, the weights in play, the target's weight and the pool. */
export interface PreparedQuery {
  readonly store: ProfileStore;
  readonly group: StoredGroup;
  readonly target: Target;
  readonly filter: PoolFilter;
  /** Weight per dimension (effectiveWeights). */
  readonly weights: Float64Array;
  /** The weighting preset asked for. */
  readonly preset: WeightPreset;
  /** Summed weight of the dimensions the target has (W_T of missingAwareDistance). */
  readonly targetWeight: number;
  /** 1 for rows in the pool (filters passed, not the target's own player). */
  readonly mask: Uint8Array;
  /** Rows in the pool. */
  readonly eligible: number;
  /** The weighting the store's indexes were built with (redundancy, balanced, no overrides). */
  readonly defaultMetric: boolean;
  readonly sampleFloor: SampleFloor | null;
  readonly missing: MissingRule;
}

/**
 * The weights in play: the stored default weights (family shares divided within each family by
 * reliability and redundancy), or 1 each for `plain`, times the preset's family multipliers and the
 * per-dimension overrides.
 */
export function effectiveWeights(g: StoredGroup, settings: QuerySettings): Float64Array {
  const user = userWeights(g.dims, settings.preset, settings.weightOverrides);
  return Float64Array.from(user, (u, j) => u * (settings.weighting === 'redundancy' ? (g.redundancy[j] ?? 0) : 1));
}

/**
 * The first step of every job: the target's group (storedGroup), the pool as a mask without the
 * target's own player (eligibleRows), the weights and the target's weight. Throws
 * `kindred.query.badTarget` when the target has no value on any weighted dimension.
 */
export function prepareQuery(store: ProfileStore, target: Target, settings: QuerySettings): PreparedQuery {
  const group = storedGroup(store, target.group);
  const weights = effectiveWeights(group, settings);
  const exclude = new Set<number>(target.player >= 0 ? [target.player] : []);
  const { mask, count } = eligibleRows(store, group, settings.filter, exclude);
  const wT = targetWeight(target.z, weights);
  if (!(wT > 0)) {
    throw new QueryError('kindred.query.badTarget', 'the target has no value on any weighted dimension', { group: target.group });
  }
  const defaultMetric = settings.weighting === 'redundancy' && settings.preset === 'balanced' && settings.weightOverrides.size === 0;
  return {
    store, group, target, filter: settings.filter, weights, preset: settings.preset, targetWeight: wT, mask, eligible: count, defaultMetric,
    sampleFloor: settings.sampleFloor ?? null,
    missing: settings.missing === 'impute' ? { impute: coreImputerOf(group) } : (settings.missing ?? missingRuleOf(group)),
  };
}
