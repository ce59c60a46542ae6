/** A store built from a small simulated league in a temp folder, for query and CLI tests. */

import { join } from 'node:path';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';
import { buildStore, type BuildOptions } from '../../src/pipeline/buildStore.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import type { SimLeague } from '../../src/sim/simTypes.ts';
import { scratchDir } from './scratchDir.ts';

export interface SimStore {
  readonly dir: string;
  readonly rosterDir: string;
  readonly storeDir: string;
  readonly league: SimLeague;
  readonly store: ProfileStore;
}

export async function simStore(targetPlayerSeasons = 8000, seed = 4242, build: Partial<BuildOptions> = {}): Promise<SimStore> {
  const dir = await scratchDir('kindred-test-');
  const league = simulateLeague({ seed, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons });
  const rosterDir = join(dir, 'roster');
  const storeDir = join(dir, 'store');
  await writeLeagueCsv(league, rosterDir);
  await buildStore(rosterDir, storeDir, { lenient: false, ...build });
  return { dir, rosterDir, storeDir, league, store: await openProfileStore(storeDir) };
}
