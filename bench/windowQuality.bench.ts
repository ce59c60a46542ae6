/**
 * Comp quality of profiles over windows of 1, 2 and 3 seasons (`--window N`) on the standard varied
 * leagues (bench/leagues.ts): `node --import tsx bench/windowQuality.bench.ts [playerSeasons] [targetsPerCase] [leagues]`
 * (also run by `npm run bench -- quality`).
 * Each league is built once with every window. A target is a player-season of the case (his season's own
 * PA or BF in the range, so every window is scored on the same targets); its comps are the windows
 * ending at any season of the pool (the top level, his group), scored against the simulator's true talents of
 * the window's last season. Ratio = the top-10 comps' mean true-talent distance over that of the 10
 * truly nearest players (1.00 is perfect, lower is better); each case is the median over its targets;
 * across leagues the mean, sd and min-max.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../src/pipeline/buildStore.ts';
import { openProfileStore } from '../src/store/openProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS } from '../src/query/findComps.ts';
import { windowView } from '../src/query/windowView.ts';
import type { PositionGroup } from '../src/profiles/positionGroup.ts';
import type { StoredGroup } from '../src/store/ProfileStore.ts';
import { compsQuality } from './lib/compsQuality.ts';
import { benchLeagues } from './leagues.ts';

const WINDOWS = [1, 2, 3] as const;

const CASES: readonly { name: string; groups: readonly PositionGroup[]; range: readonly [number, number] }[] = [
  { name: 'top hitters 400+ PA', groups: ['C', 'IF', 'OF'], range: [400, 100000] },
  { name: 'top SP 500+ BF', groups: ['SP'], range: [500, 100000] },
  { name: 'top RP 150+ BF', groups: ['RP'], range: [150, 100000] },
];

export async function runWindowQuality(playerSeasons: number, targetsPerCase: number, leagueCount = 4): Promise<string[]> {
  // results[case][window][league]
  const results = CASES.map(() => WINDOWS.map(() => [] as number[]));
  const leagues = benchLeagues(playerSeasons).slice(0, leagueCount);
  for (const spec of leagues) {
    const dir = await mkdtemp(join(tmpdir(), `kindred-window-${spec.name}-`));
    try {
      const league = simulateLeague(spec.options);
      await writeLeagueCsv(league, join(dir, 'roster'));
      const storeDir = join(dir, 'store');
      await buildStore(join(dir, 'roster'), storeDir, { lenient: false, windows: WINDOWS });
      const store = await openProfileStore(storeDir);
      // each player-season's own sample, from the single-season profiles
      const own = new Map<string, number>();
      for (const g of store.groups.values()) for (let r = 0; r < g.n; r++) own.set(`${g.player[r]}|${g.season[r]}|${g.level[r]}`, g.sample[r] as number);
      const sampleOf = (g: StoredGroup, r: number): number => own.get(`${g.player[r]}|${g.season[r]}|${g.level[r]}`) ?? 0;
      for (const [w, window] of WINDOWS.entries()) {
        const view = windowView(store, window);
        for (const [c, kase] of CASES.entries()) {
          const q = compsQuality(view, league.truth, {
            groups: kase.groups, level: 'Top', targetsPerGroup: Math.ceil(targetsPerCase / kase.groups.length), k: 10,
            seed: spec.options.seed, sampleRange: kase.range, sampleOf, compsOptions: { ...DEFAULT_COMPS_OPTIONS, exact: true },
          });
          (results[c] as number[][])[w]?.push(q.median);
          console.error(`${spec.name} window ${window} ${kase.name}: median ${q.median.toFixed(3)} over ${q.targets} targets`);
        }
      }
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  }
  const lines: string[] = [];
  lines.push(`comps quality by profile window on ${leagues.length} leagues (${leagues.map((l) => l.name).join(', ')}), ~${playerSeasons.toLocaleString('en-US')} player-seasons x size each`);
  lines.push('median ratio to the ideal per league (1.00 is perfect, lower is better): mean over leagues, sd [min-max]; wins = leagues where the window is best');
  lines.push(`${'case'.padEnd(22)}${WINDOWS.map((w) => `window ${w}`.padStart(38)).join('')}`);
  for (const [c, kase] of CASES.entries()) {
    const per = results[c] as number[][];
    const cells = WINDOWS.map((_, w) => {
      const v = per[w] as number[];
      const mean = v.reduce((a, b) => a + b, 0) / v.length;
      const sd = Math.sqrt(v.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, v.length - 1));
      const wins = v.filter((x, l) => per.every((o) => (o[l] ?? Infinity) >= x)).length;
      return `${mean.toFixed(3)} sd ${sd.toFixed(3)} [${Math.min(...v).toFixed(2)}-${Math.max(...v).toFixed(2)}] wins ${wins}`.padStart(38);
    });
    lines.push(`${kase.name.padEnd(22)}${cells.join('')}`);
  }
  lines.push(`per league (${leagues.map((l) => l.name).join(', ')}):`);
  for (const [c, kase] of CASES.entries()) {
    lines.push(`${kase.name.padEnd(22)}${WINDOWS.map((_, w) => ((results[c] as number[][])[w] as number[]).map((x) => x.toFixed(3)).join(' ').padStart(38)).join('')}`);
  }
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 30000);
  const t = Number(process.argv[3] ?? 120);
  const l = Number(process.argv[4] ?? 4);
  for (const line of await runWindowQuality(n, t, l)) console.log(line);
}
