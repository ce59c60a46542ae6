import { ParameterError } from '../errors/ParameterError.ts';
import type { CompsOptions } from '../query/findComps.ts';
import { dimensionSuggestions, findDimension, suggestionHint, type NamedDimension } from '../query/findDimension.ts';
import type { PoolFilter } from '../query/PoolFilter.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import type { JobRequest } from './JobRequest.ts';

/**
 * The pool filter and weighting of a comps-like request, checked against the store: pool levels must
 * be the store's, weights must name dimensions (by name or label; a dimension given twice, say by
 * both, is refused), and k is capped at the largest position group (no pool holds more comps).
 */
export function compsOptionsFrom(req: JobRequest, store: ProfileStore): CompsOptions {
  for (const level of req.get('poolLevel') ?? []) {
    if (!store.levels.includes(level)) {
      throw new ParameterError('pool-level', `unknown level "${level}"; the store's levels: ${store.levels.join(', ')}`, { context: { value: level } });
    }
  }
  const poolSeason = req.get('poolSeason');
  const age = req.get('age');
  const bats = req.get('bats');
  const throws = req.get('throws');
  const positions = req.get('poolPosition');
  const poolLevel = req.get('poolLevel');
  const filter: PoolFilter = {
    ...(poolLevel ? { levels: poolLevel } : {}),
    ...(poolSeason?.from !== undefined ? { seasonFrom: poolSeason.from } : {}),
    ...(poolSeason?.to !== undefined ? { seasonTo: poolSeason.to } : {}),
    ...(age?.min !== undefined ? { ageMin: age.min } : {}),
    ...(age?.max !== undefined ? { ageMax: age.max } : {}),
    ...(bats ? { bats } : {}),
    ...(throws ? { throws } : {}),
    ...(positions ? { positions } : {}),
  };
  let largest = 1;
  for (const g of store.groups.values()) largest = Math.max(largest, g.n);
  return {
    k: Math.min(req.need('k'), largest),
    exact: req.need('exact'),
    allSeasons: req.need('allSeasons'),
    filter,
    preset: req.need('preset'),
    weightOverrides: weightsByName(store, req.get('weights') ?? new Map()),
    weighting: req.need('weighting'),
    minCoverage: req.need('minCoverage'),
  };
}

/** Weights keyed by what was typed (a name or a label) turned into weights by dimension name. */
function weightsByName(store: ProfileStore, typed: ReadonlyMap<string, number>): Map<string, number> {
  const dims: NamedDimension[] = [];
  for (const g of store.groups.values()) for (const d of g.dims) if (!dims.some((x) => x.name === d.name && x.label === d.label)) dims.push(d);
  const out = new Map<string, number>();
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
