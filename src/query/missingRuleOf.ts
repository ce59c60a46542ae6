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
 * The prospect job's rule: pitchers at the expected gap (as missingRuleOf), hitters rescaled. The comps'
 * imputed gap for hitters was measured on the outlook (`KINDRED_BENCH_MISSING=1 node --import tsx
 * bench/outlook.bench.ts 15000 home,slow,fast,drifting 80`, and 160): a tie, not a win everywhere. Brier
 * skill 0.037 ± 0.038 rescaled against 0.034 ± 0.042 imputed (fast 0.006 against -0.005), 0.049 against
 * 0.049 at 160; Spearman of the peak 0.188 against 0.192 (fast 0.30 against 0.29, and 0.37 against 0.36
 * at 160); coverage equal; every difference well inside its bootstrap interval. Since it loses "fast" in
 * both runs, prospect comps keep the rule their outlook was calibrated with (docs/jobs.md).
 *
 * @example
 * prospectMissingRuleOf('IF'); // => 'rescale'
 */
export function prospectMissingRuleOf(group: PositionGroup): MissingRule {
  return isPitcherGroup(group) ? 'expected' : 'rescale';
}
