import type { z } from 'zod';
import { StoreError } from '../errors/KindredError.ts';
import { withCause } from '../errors/withCause.ts';

/**
 * Parses the JSON text of a store file and checks it against `schema`. Invalid JSON or content of
 * the wrong shape is StoreError `kindred.store.corrupt` naming the file and the first problem's path.
 *
 * @example
 * parseStoreJson('{"n":1}', z.strictObject({ n: z.number() }), '/s/group-C.json'); // => { n: 1 }
 */
export function parseStoreJson<T>(text: string, schema: z.ZodType<T>, where: string): T {
  const parsed = schema.safeParse(parseJsonText(text, where));
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw corruptFile(where, `unexpected content at ${issue?.path.join('.') ?? '?'}: ${issue?.message ?? 'invalid'}`);
  }
  return parsed.data;
}

/** JSON.parse, with a syntax error as StoreError `kindred.store.corrupt` naming the file. */
export function parseJsonText(text: string, where: string): unknown {
  try {
    return JSON.parse(text);
  } catch (error) {
    throw withCause(corruptFile(where, `not valid JSON (${error instanceof Error ? error.message : String(error)})`), error);
  }
}

/** StoreError `kindred.store.corrupt` for one file of a store: `<where>: <what>; rebuild the store`. */
export function corruptFile(where: string, what: string): StoreError {
  const file = where.slice(where.lastIndexOf('/') + 1);
  return new StoreError('kindred.store.corrupt', `${where}: ${what}; rebuild the store`, { file });
}
