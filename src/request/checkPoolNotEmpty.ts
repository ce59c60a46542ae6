import { ParameterError } from '../errors/ParameterError.ts';
import { hasEligibleRow } from '../query/eligibleRows.ts';
import type { PoolFilter } from '../query/PoolFilter.ts';
import type { Target } from '../query/Target.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';

/** Which parameter set each default-or-explicit rule (the one to name when it empties the pool). */
export interface RuleParameters {
  readonly levels: string;
  readonly seasons: string;
  readonly positions: string;
}

interface Step {
  readonly parameter: string;
  readonly part: PoolFilter;
  readonly what: string;
}

/**
 * Refuses a pool that the filters leave empty, naming the first filter (in the order positions,
 * levels, seasons, ages, bats, throws, playing time) after which no player-season of the group is
 * left: a usage error (exit 2, HTTP 400) rather than an answer with no comps. The target's own
 * player is never in the pool.
 */
export function checkPoolNotEmpty(store: ProfileStore, g: StoredGroup, target: Target, filter: PoolFilter, names: RuleParameters): void {
  const exclude = new Set<number>(target.player >= 0 ? [target.player] : []);
  if (hasEligibleRow(store, g, filter, exclude)) return;
  const steps: Step[] = [];
  const f = filter;
  if (f.positions) steps.push({ parameter: names.positions, part: { positions: f.positions }, what: `at ${f.positions.join(', ')} (the ${g.group} group holds ${positionsOf(g).join(', ')})` });
  if (f.levels) steps.push({ parameter: names.levels, part: { levels: f.levels }, what: `at ${f.levels.join(', ')}` });
  if (f.seasonFrom !== undefined || f.seasonTo !== undefined) {
    steps.push({ parameter: names.seasons, part: { ...(f.seasonFrom !== undefined ? { seasonFrom: f.seasonFrom } : {}), ...(f.seasonTo !== undefined ? { seasonTo: f.seasonTo } : {}) }, what: `in seasons ${f.seasonFrom ?? ''}-${f.seasonTo ?? ''}` });
  }
  if (f.ageMin !== undefined || f.ageMax !== undefined) {
    steps.push({ parameter: 'age', part: { ...(f.ageMin !== undefined ? { ageMin: f.ageMin } : {}), ...(f.ageMax !== undefined ? { ageMax: f.ageMax } : {}) }, what: `at ages ${f.ageMin ?? ''}-${f.ageMax ?? ''}` });
  }
  if (f.bats) steps.push({ parameter: 'bats', part: { bats: f.bats }, what: `batting ${f.bats.join(', ')}` });
  if (f.throws) steps.push({ parameter: 'throws', part: { throws: f.throws }, what: `throwing ${f.throws.join(', ')}` });
  if (f.minSample !== undefined) steps.push({ parameter: 'sample-floor', part: { minSample: f.minSample }, what: `with ${f.minSample} ${g.group === 'SP' || g.group === 'RP' ? 'BF' : 'PA'} or more` });
  let so: PoolFilter = {};
  const said: string[] = [];
  for (const step of steps) {
    so = { ...so, ...step.part };
    said.push(step.what);
    if (!hasEligibleRow(store, g, so, exclude)) {
      throw new ParameterError(step.parameter, `leaves the pool empty: no other ${g.group} player-season ${said.join(', ')}`, { context: { group: g.group } });
    }
  }
  throw new ParameterError(steps[steps.length - 1]?.parameter ?? 'pool-position', `leaves the pool empty: no other ${g.group} player-season ${said.join(', ')}`, { context: { group: g.group } });
}

function positionsOf(g: StoredGroup): string[] {
  return [...new Set(g.position)];
}
