/**
 * The standard set of varied simulated leagues for every modelling bench (outlook, comps quality, ...),
 * so that a modelling choice is measured on leagues it was not tuned on (rules: seeds, sizes, promotion
 * rates, noise, era drift, level count). Each league differs from the others on several settings at once:
 *
 * | league   | seed | size  | seasons   | minor levels | promotion margin / chance | showing noise | form noise | era drift | minors recorded from |
 * | -------- | ---- | ----- | --------- | ------------ | ------------------------- | ------------- | ---------- | --------- | -------------------- |
 * | home     | 101  | 1.0 x | 2003-2026 | 5            | 0.05 / 1 (defaults)       | 0.30          | 0          | 0         | 2003 (all)           |
 * | slow     | 202  | 0.7 x | 2001-2026 | 4            | 0.25 / 0.8                | 0.45          | 0.10       | +0.02     | 2001 (all)           |
 * | fast     | 303  | 1.3 x | 2000-2026 | 3            | -0.10 / 1                 | 0.20          | 0.20       | -0.015    | 2006                 |
 * | drifting | 404  | 0.9 x | 1998-2026 | 5            | 0.10 / 0.7                | 0.35          | 0.25       | +0.03     | 2004                 |
 *
 * "home" is the simulator's own defaults (the habits the project was built on); the others change the
 * ladder (level count), how fast players climb it, how noisy a season is (showing noise moves promotions,
 * form noise moves the stat lines), the run environment over the years, and whether early minor-league
 * seasons were recorded at all. `size` scales the player-seasons asked for.
 *
 * @example
 * for (const spec of benchLeagues(30000)) await withBenchLeague(spec, async ({ store, storeDir }) => ...);
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildStore } from '../src/pipeline/buildStore.ts';
import { openProfileStore } from '../src/store/openProfileStore.ts';
import type { ProfileStore } from '../src/store/ProfileStore.ts';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import type { SimLeague, SimOptions } from '../src/sim/simTypes.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';

export interface BenchLeague {
  readonly name: string;
  /** One line on what sets this league apart. */
  readonly description: string;
  readonly options: SimOptions;
}

/** The standard leagues, each sized to about `scale` x playerSeasons player-seasons. */
export function benchLeagues(playerSeasons = 30000): BenchLeague[] {
  const size = (scale: number): number => Math.round(playerSeasons * scale);
  return [
    {
      name: 'home',
      description: 'simulator defaults: 5 minor levels, default promotion and noise, no drift',
      options: { seed: 101, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: size(1) },
    },
    {
      name: 'slow',
      description: '4 minor levels (no A+), promotions harder and less certain, noisier showings, offense rising',
      options: {
        seed: 202, firstSeason: 2001, lastSeason: 2026, targetPlayerSeasons: size(0.7), minorLevels: 4,
        promotionMargin: 0.25, promotionChance: 0.8, showingNoise: 0.45, statNoise: 0.1, eraDrift: 0.02,
      },
    },
    {
      name: 'fast',
      description: '3 minor levels (Low, High, Elite), easy promotions, noisy stat lines, offense falling, minors recorded from 2006',
      options: {
        seed: 303, firstSeason: 2000, lastSeason: 2026, targetPlayerSeasons: size(1.3), minorLevels: 3,
        promotionMargin: -0.1, showingNoise: 0.2, statNoise: 0.2, eraDrift: -0.015, minorsRecordedFrom: 2006,
      },
    },
    {
      name: 'drifting',
      description: '5 minor levels, uncertain promotions, the noisiest stat lines, strong drift, minors recorded from 2004',
      options: {
        seed: 404, firstSeason: 1998, lastSeason: 2026, targetPlayerSeasons: size(0.9),
        promotionMargin: 0.1, promotionChance: 0.7, showingNoise: 0.35, statNoise: 0.25, eraDrift: 0.03, minorsRecordedFrom: 2004,
      },
    },
  ];
}

export interface BenchLeagueContext {
  readonly spec: BenchLeague;
  readonly league: SimLeague;
  /** The built store folder (for re-opening and the like). */
  readonly storeDir: string;
  readonly store: ProfileStore;
  /** Seconds spent simulating, writing and building. */
  readonly seconds: number;
}

/** Simulates the league, writes its roster, builds and loads a store in a temporary folder, runs `use`, then removes the folder. */
export async function withBenchLeague<T>(spec: BenchLeague, use: (ctx: BenchLeagueContext) => Promise<T>): Promise<T> {
  const dir = await mkdtemp(join(tmpdir(), `kindred-bench-${spec.name}-`));
  try {
    const started = performance.now();
    const league = simulateLeague(spec.options);
    await writeLeagueCsv(league, join(dir, 'roster'));
    const storeDir = join(dir, 'store');
    await buildStore(join(dir, 'roster'), storeDir, { lenient: false });
    const store = await openProfileStore(storeDir);
    return await use({ spec, league, storeDir, store, seconds: (performance.now() - started) / 1000 });
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}
