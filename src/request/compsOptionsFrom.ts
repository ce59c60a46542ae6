import { ParameterError } from '../errors/ParameterError.ts';
import type { CompsOptions } from '../query/findComps.ts';
import { dimensionSuggestions, findDimension, suggestionHint, type NamedDimension } from '../query/findDimension.ts';
import type { PoolFilter } from '../query/PoolFilter.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import type { JobRequest } from './JobRequest.ts';
import { poolRules, type PoolRules } from '../query/poolDefaults.ts';
import { storedGroup } from '../query/storedGroup.ts';
import type { Target } from '../query/Target.ts';
import { checkPoolNotEmpty } from './checkPoolNotEmpty.ts';

/**
 * The pool filter and weighting of a comps-like request for one target, checked against the store:
 * pool levels must be the store's, weights must name dimensions (by name or label; a dimension given
 * twice, say by both, is refused), and k is capped at the largest position group (no pool holds more
 * comps). Except for prospect comps (whose pool findProspectComps sets), the pool starts from the target's default rules (poolRules: his position, levels within
 * {level-span} of his, at least {sample-floor} of his playing time, with {recent} his latest seasons);
 * an explicit {pool-position}, {pool-level} or {pool-season} replaces the rule of its kind. A pool that
 * the filters leave empty is a usage error naming the filter that emptied it (checkPoolNotEmpty).
 */
export function compsOptionsFrom(req: JobRequest, store: ProfileStore, target: Target): CompsOptions {
  checkAgainstStore(req, store);
  const poolSeason = req.get('poolSeason');
  const age = req.get('age');
  const bats = req.get('bats');
  const throws = req.get('throws');
  const positions = req.get('poolPosition');
  const poolLevel = req.get('poolLevel');
  const g = storedGroup(store, target.group);
  // prospect comps keep their own pool (his level, his age, earlier seasons: findProspectComps), the
  // one the store's backtest calibrated the outlook on
  const rules: PoolRules =
    req.job === 'prospect'
      ? {}
      : poolRules(store, g, target, {
          adjacent: req.need('adjacent'),
          levelSpan: req.get('levelSpan') ?? Infinity,
          sampleShare: req.need('sampleFloor'),
          recentSeasons: req.get('recent') ?? Infinity,
        });
  const seasons = poolSeason ? { from: poolSeason.from, to: poolSeason.to } : { from: rules.seasonFrom, to: rules.seasonTo };
  const levels = poolLevel ?? rules.levels;
  const pos = positions ?? rules.positions;
  const filter: PoolFilter = {
    ...(levels ? { levels } : {}),
    ...(seasons.from !== undefined ? { seasonFrom: seasons.from } : {}),
    ...(seasons.to !== undefined ? { seasonTo: seasons.to } : {}),
    ...(age?.min !== undefined ? { ageMin: age.min } : {}),
    ...(age?.max !== undefined ? { ageMax: age.max } : {}),
    ...(bats ? { bats } : {}),
    ...(throws ? { throws } : {}),
    ...(pos ? { positions: pos } : {}),
    ...(rules.minSample !== undefined ? { minSample: rules.minSample } : {}),
  };
  checkPoolNotEmpty(store, g, target, filter, {
    levels: poolLevel ? 'pool-level' : 'level-span',
    seasons: poolSeason ? 'pool-season' : 'recent',
    positions: positions ? 'pool-position' : 'adjacent',
  });
  return {
    // the target's group is at most the largest, so only a k past it needs the other groups read
    k: req.need('k') <= g.n ? req.need('k') : Math.min(req.need('k'), largestGroup(store)),
    exact: req.need('exact'),
    allSeasons: req.need('allSeasons'),
    filter,
    preset: req.need('preset'),
    weightOverrides: weightsByName(store, req.get('weights') ?? new Map()),
    weighting: req.need('weighting'),
    minCoverage: req.need('minCoverage'),
    ...(rules.sampleFloor ? { sampleFloor: rules.sampleFloor } : {}),
  };
}

/**
 * The request's pool levels and weights checked against the store (what needs no target), so that a
 * misspelt option is named before the target is looked up.
 */
export function checkAgainstStore(req: JobRequest, store: ProfileStore): void {
  for (const level of req.get('poolLevel') ?? []) {
    if (!store.levels.includes(level)) {
      throw new ParameterError('pool-level', `unknown level "${level}"; the store's levels: ${store.levels.join(', ')}`, { context: { value: level } });
    }
  }
  weightsByName(store, req.get('weights') ?? new Map());
}

const largestOf = new WeakMap<ReadonlyMap<unknown, { readonly n: number }>, number>();

/** Rows of the store's largest position group (at least 1), found once per opened set of groups. */
function largestGroup(store: ProfileStore): number {
  let largest = largestOf.get(store.groups);
  if (largest === undefined) {
    largest = 1;
    for (const g of store.groups.values()) largest = Math.max(largest, g.n);
    largestOf.set(store.groups, largest);
  }
  return largest;
}

/** Weights keyed by what was typed (a name or a label) turned into weights by dimension name. */
function weightsByName(store: ProfileStore, typed: ReadonlyMap<string, number>): Map<string, number> {
  const out = new Map<string, number>();
  if (typed.size === 0) return out;
  const dims: NamedDimension[] = [];
  for (const g of store.groups.values()) for (const d of g.dims) if (!dims.some((x) => x.name === d.name && x.label === d.label)) dims.push(d);
  const givenAs = new Map<string, string>();
  for (const [text, weight] of typed) {
    const names = new Set(dims.filter((d) => findDimension([d], text) === 0).map((d) => d.name));
    if (names.size === 0) {
      throw new ParameterError('weights', `no dimension "${text}"${suggestionHint(dimensionSuggestions(dims, text))}`, {
        context: { value: text },
      });
    }
    for (const name of names) {
      const before = givenAs.get(name);
      if (before !== undefined) throw new ParameterError('weights', `"${before}" and "${text}" are the same dimension (${name}); give it once`, { context: { value: text } });
      givenAs.set(name, text);
      out.set(name, weight);
    }
  }
  return out;
}
