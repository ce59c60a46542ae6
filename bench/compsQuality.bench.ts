/**
 * Comp quality, plain z-scores against the redundancy weighting, on simulated leagues:
 * `node --import tsx bench/compsQuality.bench.ts [playerSeasons]`.
 * Prints the mean ratio (top-10 comps' true-talent distance / the 10 truly nearest players'; 1.0 is perfect).
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../src/build/buildStore.ts';
import { loadProfileStore } from '../src/query/loadProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS } from '../src/query/findComps.ts';
import { compsQuality } from './lib/compsQuality.ts';
import type { PositionGroup } from '../src/profiles/positionGroup.ts';

export async function runCompsQuality(playerSeasons: number, seed = 7): Promise<string[]> {
  const dir = await mkdtemp(join(tmpdir(), 'kindred-quality-'));
  const lines: string[] = [];
  try {
    const league = simulateLeague({ seed, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: playerSeasons });
    await writeLeagueCsv(league, join(dir, 'roster'));
    await buildStore(join(dir, 'roster'), join(dir, 'store'), { lenient: false });
    const store = await loadProfileStore(join(dir, 'store'));
    const groups: PositionGroup[] = ['C', 'IF', 'OF', 'SP', 'RP'];
    lines.push(`comps quality, ${playerSeasons.toLocaleString('en-US')} simulated player-seasons (ratio to the ideal; 1.00 is perfect, lower is better)`);
    lines.push('level  sample      targets  plain z   reliability+redundancy weights');
    for (const level of ['AA', 'MLB']) {
      for (const [label, range] of [['any', undefined], ['small', [30, 200]], ['large', [400, 10000]]] as const) {
        const base = { groups, level, targetsPerGroup: 60, k: 10, seed, ...(range ? { sampleRange: range } : {}) };
        const plain = compsQuality(store, league.truth, { ...base, compsOptions: { ...DEFAULT_COMPS_OPTIONS, weighting: 'plain', exact: true } });
        const red = compsQuality(store, league.truth, { ...base, compsOptions: { ...DEFAULT_COMPS_OPTIONS, weighting: 'redundancy', exact: true } });
        lines.push(`${level.padEnd(6)} ${label.padEnd(11)} ${String(red.targets).padStart(7)}  ${plain.ratio.toFixed(3).padStart(7)}   ${red.ratio.toFixed(3).padStart(7)}`);
      }
    }
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 30000);
  for (const line of await runCompsQuality(n)) console.log(line);
}
