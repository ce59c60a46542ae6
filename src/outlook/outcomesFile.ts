/**
 * `outcomes.json` in the store: what every player did at the top level, season by season, with the
 * league figures it was measured against. Written by kindred build (computeOutcomes), read by
 * loadOutcomes; carries a format tag and version checked on load.
 */
import { z } from 'zod';

export const OUTCOMES_FILE = 'outcomes.json';
export const OUTCOMES_FORMAT = 'kindred-outcomes';
export const OUTCOMES_VERSION = 1;

const num = z.number();

export const outcomesFileSchema = z.strictObject({
  format: z.literal(OUTCOMES_FORMAT),
  version: z.literal(OUTCOMES_VERSION),
  /** The roster's highest level, taken as MLB. */
  top_level: z.string(),
  /** First and last season with any line in the roster (every level). */
  first_season: z.number().int(),
  last_season: z.number().int(),
  /** [season, lgOBP, lgSLG, lgERA, FIP constant, lgFIP] of the top level (null where undefined). */
  league: z.array(z.tuple([z.number().int(), num.nullable(), num.nullable(), num.nullable(), num.nullable(), num.nullable()])),
  /** Top-level batting: [player_id, season, PA, OPS+ or null]. */
  batting: z.array(z.tuple([z.string(), z.number().int(), z.number().int().nonnegative(), num.nullable()])),
  /** Top-level pitching: [player_id, season, outs, BF, FIP- or null]. */
  pitching: z.array(z.tuple([z.string(), z.number().int(), z.number().int().nonnegative(), z.number().int().nonnegative(), num.nullable()])),
});

export type OutcomesFile = z.infer<typeof outcomesFileSchema>;
