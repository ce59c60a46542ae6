import { isPitcherGroup, type PositionGroup } from '../profiles/positionGroup.ts';
import type { StoredGroup } from '../store/ProfileStore.ts';
import { coreImputerOf } from './coreImputerOf.ts';
import type { MissingRule } from './missingAwareDistance.ts';

/**
 * The default rule for a dimension the target has and a pool row lacks (see MissingRule):
 * - pitchers count it at its expected gap (pitch tracking covers only recent seasons, and with the rest
 *   rescaled an untracked season looked as close to a tracked starter as a tracked one: median
 *   true-talent ratio SP 1.643 -> 1.538, RP 1.813 -> 1.654 with windows of 3, better in every bench
 *   league; bench/pitcherQuality.bench.ts, docs/jobs.md);
 * - hitters count it at its expected gap given the row's own rates (imputed from the group's core
 *   dimensions, coreImputerOf): an untracked season's exit velocity and run speed are guessed from his
 *   power and steal rates, not assumed average nor left out (windows of 5: hitters 1.335 -> 1.316,
 *   better in every bench league, the bat's own gap no larger; docs/jobs.md). Counting it at the plain
 *   expected gap won in two leagues of four only.
 *
 * @example
 * missingRuleOf(store.groups.get('SP')); // => 'expected'
 * missingRuleOf(store.groups.get('IF')); // => { impute: the IF group's lines }
 */
export function missingRuleOf(g: Pick<StoredGroup, 'group' | 'z' | 'n' | 'd'>): MissingRule {
  return isPitcherGroup(g.group) ? 'expected' : { impute: coreImputerOf(g) };
}

/**
 * The prospect job's rule: the one its outlook was backtested and calibrated with
 * (bench/outlook.bench.ts): pitchers at the expected gap, hitters rescaled. The imputed gap of
 * missingRuleOf is not yet measured on the outlook, so prospect comps keep this one.
 *
 * @example
 * prospectMissingRuleOf('IF'); // => 'rescale'
 */
export function prospectMissingRuleOf(group: PositionGroup): MissingRule {
  return isPitcherGroup(group) ? 'expected' : 'rescale';
}
