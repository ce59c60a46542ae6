/**
 * The documented JSON additions of `kindred prospect`, `cheaper` and `match` (docs/jobs.md), as zod
 * schemas the CLI tests hold the output to. They extend the comps contract (tests/cli/compsContract.ts).
 */
import { z } from 'zod';
import { compSchema, compsResultSchema } from '../cli/compsContract.ts';

const quantiles = z.strictObject({ n: z.number().int().nonnegative(), p10: z.number().nullable(), p50: z.number().nullable(), p90: z.number().nullable() });
const seasons = quantiles.extend({ mean: z.number().nullable() });
const share = z.number().min(0).max(1).nullable();
const figures = z.object({ reached_top_level: share, top_level_seasons: seasons, peak_ops_plus: quantiles.optional(), peak_fip_minus: quantiles.optional() });

const outcome = z.object({
  kind: z.enum(['hitter', 'pitcher']),
  window: z.tuple([z.number().int(), z.number().int()]),
  seasons_observed: z.number().int().nonnegative(),
  censored: z.boolean(),
  reached_top_level: z.boolean(),
  first_top_level_season: z.number().int().nullable(),
  top_level_seasons: z.number().int().nonnegative(),
  peak_season: z.number().int().nullable(),
  peak_ops_plus: z.number().nullable().optional(),
  peak_fip_minus: z.number().nullable().optional(),
});

const pathStep = z.strictObject({ season: z.number().int(), level: z.string(), age: z.number().int().nullable(), likeness: z.number(), coverage: z.number() });

export const prospectResultSchema = compsResultSchema.extend({
  query: compsResultSchema.shape.query.extend({
    horizon_seasons: z.number().int().positive(),
    path_seasons: z.number().int().positive(),
    include_censored: z.boolean(),
    path: z.array(z.strictObject({ season: z.number().int(), level: z.string(), age: z.number().int().nullable() })),
  }),
  pool: compsResultSchema.shape.pool.extend({
    rules: z.strictObject({
      level: z.string(),
      age_min: z.number().int(),
      age_max: z.number().int(),
      seasons_before: z.number().int(),
      complete_window_to: z.number().int(),
    }),
    complete_window: z.number().int().nonnegative(),
    censored: z.number().int().nonnegative(),
    likeness_floor: z.number(),
    below_likeness_floor: z.number().int().nonnegative(),
  }),
  warnings: z.array(z.string()),
  comps: z.array(compSchema.extend({ censored: z.boolean(), outcome, path: z.array(pathStep).optional() })),
  outlook: figures.extend({
    horizon_seasons: z.number().int().positive(),
    as_of_season: z.number().int(),
    comps_used: z.number().int().nonnegative(),
    comps_censored: z.number().int().nonnegative(),
    baseline: figures.extend({ player_seasons: z.number().int().nonnegative() }),
  }),
});

export const cheaperResultSchema = compsResultSchema.extend({
  pool: compsResultSchema.shape.pool.extend({
    salary: z.strictObject({
      rule: z.enum(['max-salary', 'max-share']),
      limit_usd: z.number().int().nonnegative(),
      share: z.number().nullable(),
      target_salary_usd: z.number().nullable(),
      under_limit: z.number().int().nonnegative(),
      over_limit: z.number().int().nonnegative(),
      without_salary: z.number().int().nonnegative(),
      without_salary_players: z.number().int().nonnegative(),
      likeness_floor: z.number(),
      value_reference_usd: z.number().int().positive(),
    }),
  }),
  comps: z.array(compSchema.extend({ salary_usd: z.number().nonnegative(), likeness_per_million: z.number(), value_score: z.number().min(0).max(100).nullable(), above_likeness_floor: z.boolean(), frontier: z.boolean() })),
});

export const matchResultSchema = z.object({
  query: compsResultSchema.shape.query,
  pool: compsResultSchema.shape.pool,
  candidate: compSchema.extend({
    percentile: z.number().min(0).max(100).nullable(),
    pool_players: z.number().int().nonnegative(),
    more_alike: z.number().int().nonnegative(),
    less_alike: z.number().int().nonnegative(),
    in_pool: z.boolean(),
  }),
  closest: compSchema.nullable(),
});
