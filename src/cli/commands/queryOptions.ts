import { z } from 'zod';
import { UsageError } from '../../errors/KindredError.ts';
import type { CompsOptions } from '../../query/findComps.ts';
import type { PoolFilter } from '../../query/PoolFilter.ts';
import { isWeightPreset, WEIGHT_PRESETS } from '../../query/weightPresets.ts';
import type { ProfileStore } from '../../query/ProfileStore.ts';
import { didYouMean } from '../../query/didYouMean.ts';

const positionSchema = z.enum(['C', '1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF', 'DH', 'SP', 'RP']);

/** The options commander collected for a comps-like command, checked and typed. */
export const queryOptionsSchema = z.object({
  store: z.string(),
  season: z.number().int().optional(),
  level: z.string().optional(),
  position: positionSchema.optional(),
  poolLevel: z.array(z.string()).optional(),
  poolSeason: z.object({ from: z.number().optional(), to: z.number().optional() }).optional(),
  age: z.object({ min: z.number().optional(), max: z.number().optional() }).optional(),
  bats: z.array(z.enum(['L', 'R', 'S'])).optional(),
  throws: z.array(z.enum(['L', 'R'])).optional(),
  poolPosition: z.array(positionSchema).optional(),
  k: z.number().int().positive(),
  preset: z.string(),
  weights: z.map(z.string(), z.number()).optional(),
  weighting: z.string(),
  minCoverage: z.number(),
  exact: z.boolean(),
  allSeasons: z.boolean(),
  format: z.enum(['table', 'json', 'csv']),
  batch: z.string().optional(),
});

export type QueryOptions = z.infer<typeof queryOptionsSchema>;

export function parseQueryOptions(raw: unknown): QueryOptions {
  const parsed = queryOptionsSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new UsageError(`option --${issue?.path.join('.') ?? '?'}: ${issue?.message ?? 'invalid'}`);
  }
  return parsed.data;
}

/** The pool filter and weighting of a query, with option names checked against the store. */
export function compsOptionsFrom(o: QueryOptions, store: ProfileStore): CompsOptions {
  if (!isWeightPreset(o.preset)) {
    throw new UsageError(`--preset: unknown preset "${o.preset}"; known: ${Object.keys(WEIGHT_PRESETS).join(', ')}`, { value: o.preset });
  }
  if (o.weighting !== 'redundancy' && o.weighting !== 'plain') {
    throw new UsageError(`--weighting: expected redundancy or plain, got "${o.weighting}"`, { value: o.weighting });
  }
  const known = new Set<string>();
  for (const g of store.groups.values()) for (const d of g.dims) known.add(d.name);
  for (const name of o.weights?.keys() ?? []) {
    if (!known.has(name)) {
      const guess = didYouMean(name, [...known]);
      throw new UsageError(`--weights: no dimension "${name}"${guess ? ` (did you mean ${guess}?)` : ''}; see kindred dims`, { value: name });
    }
  }
  for (const level of o.poolLevel ?? []) {
    if (!store.levels.includes(level)) {
      throw new UsageError(`--pool-level: unknown level "${level}"; the store's levels: ${store.levels.join(', ')}`, { value: level });
    }
  }
  const filter: PoolFilter = {
    ...(o.poolLevel ? { levels: o.poolLevel } : {}),
    ...(o.poolSeason?.from !== undefined ? { seasonFrom: o.poolSeason.from } : {}),
    ...(o.poolSeason?.to !== undefined ? { seasonTo: o.poolSeason.to } : {}),
    ...(o.age?.min !== undefined ? { ageMin: o.age.min } : {}),
    ...(o.age?.max !== undefined ? { ageMax: o.age.max } : {}),
    ...(o.bats ? { bats: o.bats } : {}),
    ...(o.throws ? { throws: o.throws } : {}),
    ...(o.poolPosition ? { positions: o.poolPosition } : {}),
  };
  return {
    k: o.k,
    exact: o.exact,
    allSeasons: o.allSeasons,
    filter,
    preset: o.preset,
    weightOverrides: o.weights ?? new Map(),
    weighting: o.weighting,
    minCoverage: o.minCoverage,
  };
}
