/**
 * Why hitters' comps miss arm, speed and glove: for each hitter group on the bench leagues, per
 * dimension its default weight, reliability, share missing among the case's targets and the pool, and its
 * correlation with each true talent within the exact position (which dimensions carry which talent);
 * the spread of each fielding talent by position; and the quality case's talent gaps split by whether the
 * target's window has the arm and run-speed measurements.
 * `node --import tsx bench/hitterGaps.bench.ts [playerSeasons] [targetsPerCase] [leagues] [window]`
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
import { DEFAULT_WINDOW } from '../src/query/defaultWindow.ts';
import { chooseTargets, scoreCases, type CaseTarget, type ChosenTargets } from './lib/caseQuality.ts';
import { groupTalents } from './lib/compsQuality.ts';
import { benchLeagues } from './leagues.ts';
import { TWIN_SHARE } from './qualityCases.bench.ts';

const n = Number(process.argv[2] ?? 30000);
const perCase = Number(process.argv[3] ?? 120);
const leagueCount = Number(process.argv[4] ?? 1);
const window = Number(process.argv[5] ?? DEFAULT_WINDOW);
const f = (x: number, d = 2): string => (Number.isFinite(x) ? x.toFixed(d) : '  - ').padStart(6);

function corr(xs: number[], ys: number[]): number {
  const m = xs.length;
  if (m < 3) return NaN;
  const mx = xs.reduce((a, b) => a + b, 0) / m, my = ys.reduce((a, b) => a + b, 0) / m;
  let sxy = 0, sxx = 0, syy = 0;
  for (let i = 0; i < m; i++) ((sxy += ((xs[i] as number) - mx) * ((ys[i] as number) - my)), (sxx += ((xs[i] as number) - mx) ** 2), (syy += ((ys[i] as number) - my) ** 2));
  return sxy / Math.sqrt(sxx * syy);
}

for (const spec of benchLeagues(n).slice(0, leagueCount)) {
  const dir = await mkdtemp(join(tmpdir(), `kindred-gaps-${spec.name}-`));
  try {
    const league = simulateLeague({ ...spec.options, twinShare: TWIN_SHARE });
    await writeLeagueCsv(league, join(dir, 'roster'));
    await buildStore(join(dir, 'roster'), join(dir, 'store'), { lenient: false, windows: [...new Set([1, window])] });
    const store = await openProfileStore(join(dir, 'store'));
    const chosen = chooseTargets(store, league, perCase, 0, spec.options.seed);
    const view = windowView(store, window);
    console.log(`== ${spec.name}, window ${window}`);
    const top = store.levels.length - 1;
    for (const group of ['C', 'IF', 'OF'] as const) {
      const g = view.groups.get(group);
      if (!g) continue;
      const { talents, t, names } = groupTalents(view, g, league.truth);
      const targetRows = new Set<number>();
      const rowOf = new Map<string, number>();
      for (let r = 0; r < g.n; r++) rowOf.set(`${g.player[r]}|${g.season[r]}|${g.level[r]}`, r);
      for (const ct of chosen.ratio[0] ?? []) if (ct.group === group) { const r = rowOf.get(`${ct.player}|${ct.season}|${ct.level}`); if (r !== undefined) targetRows.add(r); }
      const topRows: number[] = [];
      for (let r = 0; r < g.n; r++) if (g.level[r] === top) topRows.push(r);
      console.log(`-- ${group}: ${targetRows.size} targets, ${topRows.length} top-level rows; talents ${names.join(' ')}`);
      console.log(`${'dim'.padEnd(16)}${'weight'.padStart(7)}${'rel'.padStart(6)}${'miss T'.padStart(7)}${'miss top'.padStart(9)}  corr within position with: ${names.map((x) => x.slice(0, 6).padStart(6)).join('')}`);
      for (let j = 0; j < g.d; j++) {
        let mt = 0, mp = 0;
        for (const r of targetRows) if (Number.isNaN(g.z[r * g.d + j] as number)) mt++;
        for (const r of topRows) if (Number.isNaN(g.z[r * g.d + j] as number)) mp++;
        const cs: string[] = [];
        for (let k = 0; k < t; k++) {
          // within position: demean by position first
          const byPos = new Map<string, { x: number[]; y: number[] }>();
          for (const r of topRows) {
            const z = g.z[r * g.d + j] as number, y = talents[r * t + k] as number;
            if (Number.isNaN(z) || Number.isNaN(y)) continue;
            const p = g.position[r] ?? '?';
            let b = byPos.get(p);
            if (!b) byPos.set(p, (b = { x: [], y: [] }));
            b.x.push(z), b.y.push(y);
          }
          const X: number[] = [], Y: number[] = [];
          for (const b of byPos.values()) {
            const mx = b.x.reduce((a, c) => a + c, 0) / b.x.length, my = b.y.reduce((a, c) => a + c, 0) / b.y.length;
            b.x.forEach((x, q) => (X.push(x - mx), Y.push((b.y[q] as number) - my)));
          }
          cs.push(f(corr(X, Y)));
        }
        console.log(`${(g.dims[j]?.name ?? '').padEnd(16)}${f(g.redundancy[j] as number, 3).padStart(7)}${f(g.reliability[j] as number)}${f(mt / Math.max(1, targetRows.size)).padStart(7)}${f(mp / topRows.length).padStart(9)}  ${''.padEnd(27)}${cs.join('')}`);
      }
      // talent spread by position (top level)
      const byPos = new Map<string, number[][]>();
      for (const r of topRows) {
        const p = g.position[r] ?? '?';
        let b = byPos.get(p);
        if (!b) byPos.set(p, (b = names.map(() => [])));
        for (let k = 0; k < t; k++) if (!Number.isNaN(talents[r * t + k] as number)) b[k]?.push(talents[r * t + k] as number);
      }
      for (const [p, b] of byPos) {
        const stats = b.map((xs) => { const m = xs.reduce((a, c) => a + c, 0) / xs.length; return `${f(m)}/${f(Math.sqrt(xs.reduce((a, c) => a + (c - m) ** 2, 0) / (xs.length - 1))).trim()}`; });
        console.log(`   ${p.padEnd(3)} n=${String(b[0]?.length).padStart(5)} talent mean/sd: ${stats.join(' ')}`);
      }
    }
    // talent gaps split by coverage of arm and run speed in the target's row
    const dimAt = (group: string, name: string): number => view.groups.get(group as 'IF')?.dims.findIndex((d) => d.name === name) ?? -1;
    const has = (ct: CaseTarget, name: string): boolean => {
      const g = view.groups.get(ct.group);
      if (!g) return false;
      for (let r = 0; r < g.n; r++) if (g.player[r] === ct.player && g.season[r] === ct.season && g.level[r] === ct.level) return !Number.isNaN(g.z[r * g.d + dimAt(ct.group, name)] as number);
      return false;
    };
    const splits: [string, (ct: CaseTarget) => boolean][] = [
      ['all', () => true],
      ['arm measured', (ct) => has(ct, 'arm_mph')],
      ['arm missing', (ct) => !has(ct, 'arm_mph')],
      ['speed measured', (ct) => has(ct, 'run_speed_ft_s')],
      ['speed missing', (ct) => !has(ct, 'run_speed_ft_s')],
    ];
    for (const [label, keep] of splits) {
      const sub: ChosenTargets = { ratio: chosen.ratio.map((xs, c) => (c === 0 ? xs.filter(keep) : [])), twins: chosen.twins.map(() => []) };
      const s = scoreCases(view, league, sub, { compsOptions: DEFAULT_COMPS_OPTIONS });
      const gaps = s.talentGaps[0];
      if (!gaps) continue;
      console.log(`gaps ${label.padEnd(15)} n=${String(s.ratios[0]?.length).padStart(4)} median ${f(s.median[0] as number, 3)}  ${gaps.names.map((x, k) => `${x} ${f(gaps.comps[k] as number).trim()}/${f(gaps.ideal[k] as number).trim()}`).join('  ')}`);
    }
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}
