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
  /** The outcomes, or why they could not be read (the prospect endpoint answers with that error). */
  readonly outcomes: Outcomes | StoreError;
  /** The store's backtest (backtest.json) when present and from this build, else null with the reason. */
  readonly backtest?: { readonly file: BacktestFile | null; readonly reason: string | null };
}

/** Attempts before giving up on a store that keeps changing while it is read. */
const ATTEMPTS = 3;

const manifestText = (dir: string): Promise<string> => readFile(join(dir, MANIFEST_NAME), 'utf8').catch(() => '');

/**
 * Loads the profiles and the outcomes of one build of the store. Each is read through openStore
 * (checksums verified); the manifest is read before and after, and a store swapped in between (a
 * rebuild finishing meanwhile) is read again, so the two never come from different builds.
 */
export async function loadServedStore(dir: string): Promise<ServedStore> {
  for (let attempt = 1; ; attempt++) {
    const before = await manifestText(dir);
    const store = await openProfileStore(dir);
    const outcomes = outcomesOf(store);
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
