/**
 * The documented JSON contract of `kindred comps --format json`, as a zod schema the tests hold the
 * output to (README: "JSON output").
 */
import { z } from 'zod';

const position = z.enum(['C', '1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF', 'DH', 'SP', 'RP']);

export const dimensionDetailSchema = z.object({
  name: z.string(),
  target: z.number().nullable(),
  comp: z.number().nullable(),
  target_grade: z.number().int().min(20).max(80).nullable(),
  comp_grade: z.number().int().min(20).max(80).nullable(),
  share: z.number().min(0).max(1),
  missing: z.boolean(),
  attribution: z.number().optional(),
});

export const compSchema = z.object({
  rank: z.number().int().positive(),
  player_id: z.string(),
  name: z.string(),
  season: z.number().int(),
  seasons: z.tuple([z.number().int(), z.number().int()]).optional(),
  level: z.string(),
  position,
  age: z.number().int().nullable(),
  sample: z.number().int().nonnegative(),
  sample_unit: z.enum(['PA', 'BF']),
  /** Innings pitched in thirds notation (common practice: the digit after the point counts outs). */
  ip: z.string().regex(/^\d+\.[012]$/).nullable(),
  likeness: z.number().min(0).max(100),
  distance: z.number().nonnegative(),
  coverage: z.number().min(0).max(1),
  dimensions: z.array(dimensionDetailSchema),
  alike: z.array(z.string()).max(3),
  apart: z.array(z.string()).max(3),
  attribution_total: z.number().optional(),
});

export const compsResultSchema = z.object({
  query: z.object({
    kind: z.enum(['player', 'want']),
    player_id: z.string().nullable(),
    name: z.string().nullable(),
    season: z.number().int().nullable(),
    window: z.number().int().min(2).optional(),
    seasons: z.tuple([z.number().int(), z.number().int()]).optional(),
    level: z.string().nullable(),
    position,
    group: z.enum(['C', 'IF', 'OF', 'DH', 'SP', 'RP']),
    age: z.number().int().nullable(),
    profile: z.record(z.string(), z.number()),
    k: z.number().int().positive(),
    method: z.enum(['hnsw', 'exact']),
    space: z.enum(['input', 'pca', 'autoencoder']),
  }),
  pool: z.object({
    group_size: z.number().int(),
    eligible: z.number().int(),
    filters: z.record(z.string(), z.unknown()),
    weights: z.record(z.string(), z.number()),
    preset: z.string(),
    family_shares: z.record(z.string(), z.number()),
    sample_floor: z
      .strictObject({
        unit: z.enum(['PA', 'BF']),
        min: z.number().int().positive(),
        share: z.number().min(0).max(1),
        target_sample: z.number().int().nonnegative(),
        target_sample_from: z.enum(['target', 'group median']),
      })
      .nullable(),
    summary: z.string().min(1),
  }),
  comps: z.array(compSchema),
});
