import { isPitcherGroup, type PositionGroup } from '../profiles/positionGroup.ts';
import type { MissingRule } from './missingAwareDistance.ts';

/**
 * The default rule for a dimension the target has and a pool row lacks: pitchers count it at its
 * expected gap (pitch tracking covers only recent seasons, and with the rest rescaled an untracked
 * season looked as close to a tracked starter as a tracked one: median true-talent ratio SP 1.643 ->
 * 1.538, RP 1.813 -> 1.654 with windows of 3, better in every bench league; bench/pitcherQuality.bench.ts,
 * docs/jobs.md); hitters keep the rescaled distance (it won in two or three leagues of four only).
 *
 * @example
 * missingRuleOf('SP'); // => 'expected'
 * missingRuleOf('IF'); // => 'rescale'
 */
export function missingRuleOf(group: PositionGroup): MissingRule {
  return isPitcherGroup(group) ? 'expected' : 'rescale';
}
