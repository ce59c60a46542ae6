/**
 * The comps-quality cases and their aims (top-level hitters 400+ PA, SP 500+ BF, RP 150+ BF, planted
 * twins), on the standard varied leagues (bench/leagues.ts) with twins planted in each, for profiles over
 * windows of 1, 3 and 5 seasons (others by the 6th argument), with the comps a user gets by default (default pool rules and weighting):
 * `node --import tsx bench/qualityCases.bench.ts [playerSeasons] [targetsPerCase] [leagues] [twinsPerCase] [windows]`
 * (also run by `npm run bench -- quality`). Scoring: bench/lib/caseQuality.ts. Each league is built once
 * with every window; its figure per case is the median ratio over the case's targets (twins: the share
 * found in the top 10); across leagues the mean, sd and min-max, and the aims on the worst league (an aim
 * is for every league); the hitters' bat gap (caseQuality.batGap: their comps' squared true-talent gap in
 * contact, power and eye, which a variant must not grow). The embedding case (an embedded store against the input space) is its own bench:
 * `npm run bench -- embed-quality`.
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
import { aim, type Aim } from './lib/aim.ts';
import { batGap, chooseTargets, QUALITY_CASES, scoreCases } from './lib/caseQuality.ts';
import { benchLeagues } from './leagues.ts';

/** The windows compared (the 6th argument, e.g. `1,3,5`; default 1, 3, 5). */
const WINDOWS: readonly number[] = (process.argv[6] ?? '1,3,5').split(',').map(Number);
/** Share of the top-level careers given a planted twin in every bench league. */
export const TWIN_SHARE = 0.1;

/** The aims of the cases (on every league): ratio at most (relievers have none), twins found at least. */
const RATIO_AIMS: readonly (Aim | null)[] = [{ atMost: 1.3 }, { atMost: 1.8 }, null];
const TWIN_AIM: Aim = { atLeast: 0.8 };

const mean = (xs: readonly number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
const sd = (xs: readonly number[]): number => Math.sqrt(xs.reduce((a, x) => a + (x - mean(xs)) ** 2, 0) / Math.max(1, xs.length - 1));
const summary = (xs: readonly number[], digits = 3): string =>
  `${mean(xs).toFixed(digits)} ± ${sd(xs).toFixed(digits)} [${Math.min(...xs).toFixed(2)}-${Math.max(...xs).toFixed(2)}]`;

export async function runQualityCases(playerSeasons: number, targetsPerCase: number, leagueCount = 4, twinsPerCase = 60): Promise<string[]> {
  const leagues = benchLeagues(playerSeasons).slice(0, leagueCount);
  // median[case][window][league]; twins[window][league] as found / targets over the cases
  const median = QUALITY_CASES.map(() => WINDOWS.map(() => [] as number[]));
  const twinShare = WINDOWS.map(() => [] as number[]);
  const twinCounts = WINDOWS.map(() => [] as string[]);
  const twinByCase = QUALITY_CASES.map(() => WINDOWS.map(() => [] as string[]));
  const bat = WINDOWS.map(() => [] as number[]);
  for (const spec of leagues) {
    const dir = await mkdtemp(join(tmpdir(), `kindred-cases-${spec.name}-`));
    try {
      const league = simulateLeague({ ...spec.options, twinShare: TWIN_SHARE });
      await writeLeagueCsv(league, join(dir, 'roster'));
      const storeDir = join(dir, 'store');
      await buildStore(join(dir, 'roster'), storeDir, { lenient: false, windows: [...new Set([1, ...WINDOWS])] });
      const store = await openProfileStore(storeDir);
      const chosen = chooseTargets(store, league, targetsPerCase, twinsPerCase, spec.options.seed);
      for (const [w, window] of WINDOWS.entries()) {
        const s = scoreCases(windowView(store, window), league, chosen, { compsOptions: DEFAULT_COMPS_OPTIONS });
        for (const [c] of QUALITY_CASES.entries()) {
          (median[c] as number[][])[w]?.push(s.median[c] as number);
          (twinByCase[c] as string[][])[w]?.push(`${s.twinsFound[c]}/${s.twinTargets[c]}`);
        }
        bat[w]?.push(batGap(s.talentGaps[0]));
        const found = s.twinsFound.reduce((a, b) => a + b, 0);
        const scored = s.twinTargets.reduce((a, b) => a + b, 0);
        twinShare[w]?.push(found / scored);
        twinCounts[w]?.push(`${found}/${scored}`);
        console.error(
          `${spec.name} window ${window}: ${QUALITY_CASES.map((k, c) => `${k.name} ${(s.median[c] as number).toFixed(3)} (${s.ratios[c]?.length} targets)`).join(', ')}; twins ${found}/${scored} (${s.twinsFound.join('+')} of ${s.twinTargets.join('+')})`,
        );
      }
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  }
  const lines: string[] = [];
  lines.push(`comps quality cases on ${leagues.length} leagues (${leagues.map((l) => l.name).join(', ')}), ~${playerSeasons.toLocaleString('en-US')} player-seasons x size each, ${Math.round(TWIN_SHARE * 100)}% of top-level careers twinned`);
  lines.push('ratio: median over targets of (top-10 comps\u2019 true-talent distance / the 10 truly nearest\u2019s), 1.00 perfect, lower better; twins: share of twin targets whose twin is in the top 10');
  lines.push('per league: mean ± sd [min-max] over leagues; wins = leagues where the window is best');
  lines.push(`${'case'.padEnd(22)}${WINDOWS.map((w) => `window ${w}${w === DEFAULT_WINDOW ? ' (default)' : ''}`.padStart(40)).join('')}`);
  const wins = (per: readonly (readonly number[])[], w: number, better: (a: number, b: number) => boolean): number =>
    (per[w] ?? []).filter((x, l) => per.every((o, ow) => ow === w || !better(o[l] ?? NaN, x))).length;
  for (const [c, kase] of QUALITY_CASES.entries()) {
    const per = median[c] as number[][];
    lines.push(`${kase.name.padEnd(22)}${WINDOWS.map((_, w) => `${summary(per[w] ?? [])} wins ${wins(per, w, (a, b) => a < b)}`.padStart(40)).join('')}`);
  }
  lines.push(`${'twins found in top 10'.padEnd(22)}${WINDOWS.map((_, w) => `${summary(twinShare[w] ?? [], 2)} wins ${wins(twinShare, w, (a, b) => a > b)}`.padStart(40)).join('')}`);
  lines.push(`${"hitters' bat gap".padEnd(22)}${WINDOWS.map((_, w) => `${summary(bat[w] ?? [], 2)}`.padStart(40)).join('')}`);
  lines.push(`${'embedding vs input'.padEnd(22)}${'see npm run bench -- embed-quality'.padStart(40)}`);
  lines.push(`per league (${leagues.map((l) => l.name).join(', ')}):`);
  for (const [c, kase] of QUALITY_CASES.entries()) {
    lines.push(`${kase.name.padEnd(22)}${WINDOWS.map((_, w) => ((median[c] as number[][])[w] ?? []).map((x) => x.toFixed(3)).join(' ').padStart(40)).join('')}`);
  }
  lines.push(`${"hitters' bat gap".padEnd(22)}${WINDOWS.map((_, w) => (bat[w] ?? []).map((x) => x.toFixed(2)).join(' ').padStart(40)).join('')}`);
  lines.push(`${'twins found/targets'.padEnd(22)}${WINDOWS.map((_, w) => (twinCounts[w] ?? []).join(' ').padStart(40)).join('')}`);
  for (const [c, kase] of QUALITY_CASES.entries()) {
    lines.push(`${`  of which ${kase.name.replace('top ', '')}`.padEnd(22)}${WINDOWS.map((_, w) => ((twinByCase[c] as string[][])[w] ?? []).join(' ').padStart(40)).join('')}`);
  }
  const d = WINDOWS.indexOf(DEFAULT_WINDOW);
  lines.push(`aims (default window ${DEFAULT_WINDOW}, worst league):`);
  for (const [c, kase] of QUALITY_CASES.entries()) {
    const worst = Math.max(...((median[c] as number[][])[d] ?? []));
    const target = RATIO_AIMS[c];
    lines.push(`  ${kase.name}: ${worst.toFixed(3)} ${target ? aim(`quality ${kase.name} (worst league)`, worst, target) : '(no aim)'}`);
  }
  const worstTwins = Math.min(...(twinShare[d] ?? []));
  lines.push(`  twins found in top 10: ${worstTwins.toFixed(2)} ${aim('quality twins found (worst league)', worstTwins, TWIN_AIM)}`);
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 30000);
  const t = Number(process.argv[3] ?? 120);
  const l = Number(process.argv[4] ?? 4);
  const tw = Number(process.argv[5] ?? 60);
  for (const line of await runQualityCases(n, t, l, tw)) console.log(line);
}
