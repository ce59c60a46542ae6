import { StoreError } from '../errors/KindredError.ts';
import type { ProfileStore } from '../query/ProfileStore.ts';
import { resolve } from 'node:path';
import { openStore } from '../store/openStore.ts';
import { Outcomes } from './Outcomes.ts';
import { OUTCOMES_FILE, OUTCOMES_FORMAT, OUTCOMES_VERSION, outcomesFileSchema, type OutcomesFile } from './outcomesFile.ts';

/** Parses and checks the text of outcomes.json (format tag, version, shape). */
export function parseOutcomesFile(text: string, where: string): OutcomesFile {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (e) {
    throw new StoreError('kindred.store.corrupt', `${where}: not valid JSON (${e instanceof Error ? e.message : String(e)}); rebuild the store`, { file: OUTCOMES_FILE });
  }
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
    throw new StoreError('kindred.store.corrupt', `${where}: unexpected content at ${issue?.path.join('.') ?? '?'}: ${issue?.message ?? 'invalid'}; rebuild the store`, {
      file: OUTCOMES_FILE,
    });
  }
  return parsed.data;
}

/**
 * The top-level outcomes of the store in `dir`, read through the store's verified OpenStore (the
 * one the profiles were loaded from, when `dir` is that store's folder, so that both come from one
 * build and the checksums are not verified twice). A store built before outcomes were kept has no outcomes.json: StoreError
 * `kindred.store.missing`, asking for a rebuild.
 */
export async function loadOutcomes(dir: string, store: ProfileStore): Promise<Outcomes> {
  const opened = resolve(store.opened.dir) === resolve(dir) ? store.opened : await openStore(dir);
  if (!(OUTCOMES_FILE in opened.manifest.files)) {
    throw new StoreError('kindred.store.missing', `store at ${opened.dir} has no ${OUTCOMES_FILE} (built by an older kindred); rebuild it with kindred build`, {
      dir: opened.dir,
      file: OUTCOMES_FILE,
    });
  }
  const where = `${opened.dir}/${OUTCOMES_FILE}`;
  return new Outcomes(parseOutcomesFile(await opened.readText(OUTCOMES_FILE), where), store.playerById, where);
}
