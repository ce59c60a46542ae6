/**
 * `outcomes.json` in the store: what every player did at the top level, season by season, with the
 * league figures it was measured against. Computed by the build (src/outlook/computeOutcomes.ts),
 * written by encodeOutcomesFile, read by decodeOutcomesFile; carries a format tag and version checked on load.
 */
import { z } from 'zod';
import { StoreError } from '../errors/KindredError.ts';
import { corruptFile, parseJsonText } from './parseStoreJson.ts';
import { OUTCOMES_FILE } from './storeFileNames.ts';

export const OUTCOMES_FORMAT = 'kindred-outcomes';
export const OUTCOMES_VERSION = 1;

const num = z.number();

export const outcomesFileSchema = z.strictObject({
  format: z.literal(OUTCOMES_FORMAT),
  version: z.literal(OUTCOMES_VERSION),
  /** The roster's highest declared level: the top level of every outcome. */
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

/** The text of outcomes.json. */
export function encodeOutcomesFile(file: OutcomesFile): string {
  return JSON.stringify(file);
}

/**
 * Parses and checks the text of outcomes.json (`where` names it in errors): another format or version
 * is StoreError `kindred.store.version`, bad JSON or shape `kindred.store.corrupt`.
 */
export function decodeOutcomesFile(text: string, where: string): OutcomesFile {
  const value = parseJsonText(text, where);
  const head = typeof value === 'object' && value !== null ? new Map<string, unknown>(Object.entries(value)) : new Map<string, unknown>();
  if (head.get('format') !== OUTCOMES_FORMAT || head.get('version') !== OUTCOMES_VERSION) {
    throw new StoreError(
      'kindred.store.version',
      `${where}: format ${JSON.stringify(head.get('format'))} version ${JSON.stringify(head.get('version'))}, expected ${OUTCOMES_FORMAT} version ${OUTCOMES_VERSION}; rebuild the store`,
      { file: OUTCOMES_FILE },
    );
  }
  const parsed = outcomesFileSchema.safeParse(value);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw corruptFile(where, `unexpected content at ${issue?.path.join('.') ?? '?'}: ${issue?.message ?? 'invalid'}`);
  }
  return parsed.data;
}
