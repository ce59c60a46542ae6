/** A small simulated league written as a roster and built into a store in a temp folder (once per test file). */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import type { SimOptions } from '../../src/sim/simTypes.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';

export const TEST_LEAGUE: SimOptions = { seed: 4242, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: 8000 };

export interface SimStore {
  readonly dir: string;
  readonly rosterDir: string;
  readonly storeDir: string;
  remove(): Promise<void>;
}

export async function buildSimStore(options: SimOptions = TEST_LEAGUE): Promise<SimStore> {
  const dir = await mkdtemp(join(tmpdir(), 'kindred-outlook-'));
  const rosterDir = join(dir, 'roster');
  const storeDir = join(dir, 'store');
  await writeLeagueCsv(simulateLeague(options), rosterDir);
  await buildStore(rosterDir, storeDir, { lenient: false });
  return { dir, rosterDir, storeDir, remove: () => rm(dir, { recursive: true, force: true }) };
}

import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import type { TargetRow } from '../../src/query/selectTargetRow.ts';
import type { PositionGroup } from '../../src/profiles/positionGroup.ts';

/** Rows of a group that pass a test, in row order. */
export function rowsWhere(store: ProfileStore, group: PositionGroup, test: (row: number) => boolean): TargetRow[] {
  const g = store.groups.get(group);
  const out: TargetRow[] = [];
  if (!g) return out;
  for (let i = 0; i < g.n; i++) if (test(i)) out.push({ group, row: i });
  return out;
}
