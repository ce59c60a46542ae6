/**
 * The JSON part of a position group in the store (`group-<G>.json`): dimensions, weights, strata and
 * the partitions' index metadata, all small. The row metadata (player, season, level, position, age,
 * sample, teams) and the partitions' row lists are a columns file beside it, `group-<G>.rows.bin`
 * (src/store/columnsFile.ts, columns in GROUP_ROW_COLUMNS); the numbers are `group-<G>.raw.f32` and
 * `group-<G>.z.f32`. Written by encodeGroupFiles (src/store/encodeGroupFiles.ts), read by readGroup.
 */
import { z } from 'zod';
import { POSITION_GROUPS } from '../profiles/positionGroup.ts';
import { SKILL_FAMILIES } from '../profiles/skillFamily.ts';

const sha256Text = z.string().regex(/^[0-9a-f]{64}$/);

const dimensionInfoSchema = z.strictObject({
  name: z.string(),
  label: z.string(),
  unit: z.string(),
  direction: z.enum(['higher', 'lower', 'neither']),
  meaning: z.string(),
  source: z.string(),
  skill: z.string(),
  family: z.enum(SKILL_FAMILIES),
  scope: z.enum(['group', 'position']),
  digits: z.number().int(),
  stabilisation: z.number(),
});

const indexSchema = z.strictObject({ M: z.number(), efConstruction: z.number(), ef: z.number(), seed: z.number(), dim: z.number(), count: z.number() });

export const groupFileSchema = z.strictObject({
  group: z.enum(POSITION_GROUPS),
  n: z.number().int().nonnegative(),
  /**
   * sha256 of the two matrices beside this file (`group-<G>.raw.f32`, `group-<G>.z.f32`). They have the
   * same size, so only their content tells them apart: with these, raw and standardised files swapped
   * (or taken from another store), even with the manifest's checksums rewritten, are refused.
   */
  matrices: z.strictObject({ raw: sha256Text, z: sha256Text }),
  dims: z.array(dimensionInfoSchema),
  /** Default weight per dimension: family share times within-family reliability and redundancy. */
  redundancy: z.array(z.number()),
  reliability: z.array(z.number()),
  /** Per dimension: [stratum key, mean, sd, n, first season, last season]. */
  strata: z.record(z.string(), z.array(z.tuple([z.string(), z.number(), z.number(), z.number(), z.number(), z.number()]))),
  /**
   * Per dimension: [league stratum key (`season|level`, plus `|position` for fielding), k used, the table's k,
   * 'fitted' or 'table', player-seasons the fit rested on]; dimensions that are not regressed have none.
   */
  shrinkage: z.record(z.string(), z.array(z.tuple([z.string(), z.number(), z.number(), z.enum(['fitted', 'table']), z.number()]))),
  /** The index of `group-<G>.hnsw` over all rows (the codes of a learned space); null in the input space. */
  index: indexSchema.nullable(),
  /**
   * Input space: the rows split by coverage pattern (src/ann/partitionByCoverage.ts), each with the
   * dimensions its vectors hold, its row count (its rows are the next `rows` of the `partition_rows`
   * column of `group-<G>.rows.bin`) and, when it is large enough, its own index `group-<G>.p<i>.hnsw`;
   * `narrow`, when its wider partitions hold enough rows, the index `group-<G>.p<i>.narrow.hnsw` over
   * their rows on this partition's dimensions (src/ann/narrowRows.ts).
   */
  partitions: z.array(
    z.strictObject({
      dims: z.array(z.number().int().nonnegative()),
      rows: z.number().int().nonnegative(),
      index: indexSchema.nullable(),
      narrow: indexSchema.nullable(),
    }),
  ),
  /**
   * Present when comps are ranked in a learned space: its kind and code size (the index then holds the
   * codes, `index.dim` = `dim`). The model, codes and summary are `group-<G>.{model.json,codes.f64,embedding.json}`.
   */
  embedding: z
    .strictObject({
      space: z.enum(['pca', 'autoencoder']),
      dim: z.number().int().positive(),
      /** sha256 of the three embedding files, so that files swapped between groups (same shapes) are refused. */
      sha256: z.strictObject({ summary: sha256Text, model: sha256Text, codes: sha256Text }),
    })
    .optional(),
  /**
   * Present on profiles over windows of several seasons (`group-<G>.w<N>.json`): the seasons per window
   * and each row's first season (its last is `rows.season`).
   */
  window: z.strictObject({ size: z.number().int().min(2), first: z.array(z.number().int()) }).optional(),
});

export type GroupFile = z.infer<typeof groupFileSchema>;


/**
 * Columns of `group-<G>.rows.bin`, one value per group row unless said: `player` and `level` (i32,
 * store indices), `season` (i32), `position` (u8, index in POSITIONS), `age` (f64, NaN unknown),
 * `sample` (i32, PA or BF), `outs` (f64, outs recorded by a pitcher row, NaN for hitter rows), `team` (i32, index in `team_name`), `team_name` (strings, the distinct
 * team lists joined by '/'), `partition_rows` (i32, every partition's rows in partition order).
 */
export const GROUP_ROW_COLUMNS = ['player', 'season', 'level', 'position', 'age', 'sample', 'outs', 'team', 'team_name', 'partition_rows'] as const;
