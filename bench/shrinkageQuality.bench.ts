/**
 * Comp quality on the standard varied leagues (bench/leagues.ts), fixed-table shrinkage against k
 * fitted to the roster: `node --import tsx bench/shrinkageQuality.bench.ts [playerSeasons] [targetsPerCase]`
 * (also run by `npm run bench -- quality`).
 * Each league is simulated and written once, then built once per shrinkage setting. Ratio = the top-10
 * comps' mean true-talent distance over that of the 10 truly nearest players (1.00 is perfect, lower
 * is better); each case is the median over its targets; across leagues the mean and spread (min-max).
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../src/pipeline/buildStore.ts';
import { openProfileStore } from '../src/store/openProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS } from '../src/query/findComps.ts';
import { DEFAULT_PROFILE_OPTIONS } from '../src/profiles/buildProfiles.ts';
import { DEFAULT_SHRINKAGE, type ShrinkageOptions } from '../src/profiles/shrinkage.ts';
import type { PositionGroup } from '../src/profiles/positionGroup.ts';
import { compsQuality } from './lib/compsQuality.ts';
import { benchLeagues } from './leagues.ts';

const SETTINGS: readonly { name: string; shrinkage: ShrinkageOptions }[] = [
  { name: 'table (k = sample)', shrinkage: { ...DEFAULT_SHRINKAGE, fit: false, tableScale: 1 } },
  { name: 'table (k = 3/7 sample)', shrinkage: { ...DEFAULT_SHRINKAGE, fit: false, tableScale: 3 / 7 } },
  { name: 'fitted (fallback k = sample)', shrinkage: { ...DEFAULT_SHRINKAGE, fit: true, tableScale: 1 } },
];

const CASES: readonly { name: string; groups: readonly PositionGroup[]; range: readonly [number, number] }[] = [
  { name: 'Top hitters 400+ PA', groups: ['C', 'IF', 'OF'], range: [400, 100000] },
  { name: 'Top SP 500+ BF', groups: ['SP'], range: [500, 100000] },
  { name: 'Top RP 150+ BF', groups: ['RP'], range: [150, 100000] },
];

export async function runShrinkageQuality(playerSeasons: number, targetsPerCase: number): Promise<string[]> {
  // results[case][setting][league]
  const results = CASES.map(() => SETTINGS.map(() => [] as number[]));
  const leagues = benchLeagues(playerSeasons);
  for (const spec of leagues) {
    const dir = await mkdtemp(join(tmpdir(), `kindred-quality-${spec.name}-`));
    try {
      const league = simulateLeague(spec.options);
      await writeLeagueCsv(league, join(dir, 'roster'));
      for (const [s, setting] of SETTINGS.entries()) {
        const storeDir = join(dir, `store-${s}`);
        await buildStore(join(dir, 'roster'), storeDir, { lenient: false, profile: { ...DEFAULT_PROFILE_OPTIONS, shrinkage: setting.shrinkage } });
        const store = await openProfileStore(storeDir);
        for (const [c, kase] of CASES.entries()) {
          const q = compsQuality(store, league.truth, {
            groups: kase.groups, level: 'Top', targetsPerGroup: Math.ceil(targetsPerCase / kase.groups.length), k: 10,
            seed: spec.options.seed, sampleRange: kase.range, compsOptions: { ...DEFAULT_COMPS_OPTIONS, exact: true },
          });
          (results[c] as number[][])[s]?.push(q.median);
          console.error(`${spec.name} ${setting.name} ${kase.name}: median ${q.median.toFixed(3)} over ${q.targets} targets`);
        }
        await rm(storeDir, { recursive: true, force: true });
      }
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  }
  const lines: string[] = [];
  lines.push(`comps quality on ${leagues.length} leagues (${leagues.map((l) => l.name).join(', ')}), ~${playerSeasons.toLocaleString('en-US')} player-seasons x size each`);
  lines.push('median ratio to the ideal per league (1.00 is perfect, lower is better): mean over leagues, sd [min-max]');
  lines.push(`${'case'.padEnd(22)}${SETTINGS.map((s) => s.name.padStart(34)).join('')}`);
  for (const [c, kase] of CASES.entries()) {
    const cells = SETTINGS.map((_, s) => {
      const v = (results[c] as number[][])[s] as number[];
      const mean = v.reduce((a, b) => a + b, 0) / v.length;
      const sd = Math.sqrt(v.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, v.length - 1));
      return `${mean.toFixed(3)} sd ${sd.toFixed(3)} [${Math.min(...v).toFixed(2)}-${Math.max(...v).toFixed(2)}]`.padStart(34);
    });
    lines.push(`${kase.name.padEnd(22)}${cells.join('')}`);
  }
  lines.push('per league (same order as above):');
  for (const [c, kase] of CASES.entries()) {
    lines.push(`${kase.name.padEnd(22)}${SETTINGS.map((_, s) => ((results[c] as number[][])[s] as number[]).map((x) => x.toFixed(3)).join(' ').padStart(34)).join('')}`);
  }
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 30000);
  const t = Number(process.argv[3] ?? 120);
  for (const line of await runShrinkageQuality(n, t)) console.log(line);
}
