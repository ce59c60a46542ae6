import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { StoreError } from '../errors/KindredError.ts';
import { MANIFEST_NAME } from '../store/manifest.ts';
import { openProfileStore } from '../store/openProfileStore.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import type { Outcomes } from '../outlook/Outcomes.ts';
import { readBacktestFile } from '../outlook/backtestStore.ts';
import type { BacktestFile } from '../outlook/backtestFile.ts';

/** What the server answers from: the profiles and, when the store has them, the top-level outcomes. */
export interface ServedStore {
  readonly store: ProfileStore;
  /**
   * The outcomes, or why they could not be read (the prospect endpoint answers with that error); as a
   * function, read when first asked for (LoadedStore keeps the first answer).
   */
  readonly outcomes: Outcomes | StoreError | (() => Outcomes | StoreError);
  /** The store's backtest (backtest.json) when present and from this build, else null with the reason. */
  readonly backtest?: { readonly file: BacktestFile | null; readonly reason: string | null };
}

/** Attempts before giving up on a store that keeps changing while it is read. */
const ATTEMPTS = 3;

const manifestText = (dir: string): Promise<string> => readFile(join(dir, MANIFEST_NAME), 'utf8').catch(() => '');

/**
 * Opens the profiles of one build of the store, with its outcomes to be read on first use. Each file
 * is read through openStore (checksums verified when first read) and through the file descriptors the
 * open took, so the outcomes read later come from the same build as the profiles even when a rebuild
 * has swapped a new folder in meanwhile; the manifest is read before and after the open, and a store
 * swapped in between is opened again. Why lazily: at 1M player-seasons decoding outcomes.json took
 * about 0.7 s of CPU at every load and reload, while only the prospect and backtest answers read it.
 * `previous` (a reload): the groups it has read are taken over where the files are unchanged
 * (openProfileStore's `reuse`), so a reload of an unchanged store reads none of them again.
 */
export async function loadServedStore(dir: string, previous?: ProfileStore): Promise<ServedStore> {
  for (let attempt = 1; ; attempt++) {
    const before = await manifestText(dir);
    const store = await openProfileStore(dir, previous ? { reuse: previous } : {});
    const outcomes = (): Outcomes | StoreError => outcomesOf(store);
    const backtest = await readBacktestFile(store);
    if ((await manifestText(dir)) === before) return { store, outcomes, backtest };
    if (attempt >= ATTEMPTS) {
      throw new StoreError('kindred.store.corrupt', `${dir} changed ${ATTEMPTS} times while it was read; try the reload again when the build is done`, { dir });
    }
  }
}

function outcomesOf(store: ProfileStore): Outcomes | StoreError {
  try {
    return store.outcomes();
  } catch (error) {
    if (error instanceof StoreError) return error;
    throw error;
  }
}
