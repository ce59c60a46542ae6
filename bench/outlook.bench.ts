/**
 * Honesty of the prospect outlook on the standard varied simulated leagues (bench/leagues.ts):
 *   node --import tsx bench/outlook.bench.ts [playerSeasons] [leagues] [perSeason]
 * e.g. `... 15000 home,slow,fast,drifting 80`.
 *
 * For each league: the roster is built, every prospect-season (sampled, `perSeason` per season and kind)
 * is forecast as of its own season (collectForecasts), and the rolling-origin backtest (runBacktest)
 * fits the calibration at each cut on what was known then and scores the cut's prospects. Printed per
 * league and kind, with 95% bootstrap intervals: Brier skill of the calibrated probability against the
 * level-and-age base rate and against the matched base rate, Murphy reliability and resolution,
 * Spearman of the peak p50 with the realised peak, p10-p90 coverage of the peak (after and before the
 * conformal adjustment) and of top-level seasons, each main figure against its aim (bench/lib/aim.ts). Then
 * the alternatives the defaults were chosen from (pool with a playing-time band, level path; fixed
 * calibration maps and features: age for the level, level path, promotion during the season, his own
 * profile at three ridges, a ridge peak model; the default chooses among some of them per roster), the
 * true-talent reference, and mean and spread over leagues. `KINDRED_BENCH_MAPS='a|b'` keeps only the
 * maps whose names contain a or b (and the default). The aims (issue 9): skill vs the
 * level-and-age base rate >= 0.15, Spearman of the peak p50 >= 0.60, peak p10-p90 coverage 0.75-0.85.
 */
import { aim } from './lib/aim.ts';
import { benchLeagues, withBenchLeague } from './leagues.ts';
import { collectForecasts, type RawForecast } from '../src/outlook/collectForecasts.ts';
import { runBacktest, trainingFor, type KindBacktest, type WithInterval } from '../src/outlook/runBacktest.ts';
import { fitLogistic, logisticProbability } from '../src/stats/fitLogistic.ts';
import { brierScore } from '../src/stats/brierScore.ts';
import { spearmanCorrelation } from '../src/stats/spearmanCorrelation.ts';
import { playerIndexOf } from '../src/sim/SimTruth.ts';
import type { SimLeague } from '../src/sim/simTypes.ts';
import type { ProfileStore } from '../src/store/ProfileStore.ts';
import { DEFAULT_PROSPECT_OPTIONS, type ProspectOptions } from '../src/jobs/findProspectComps.ts';
import { DEFAULT_CALIBRATION, type CalibrationChoice } from '../src/outlook/calibrateForecast.ts';
import { POSITION_GROUPS, isPitcherGroup, type PositionGroup } from '../src/profiles/positionGroup.ts';

const playerSeasons = Number(process.argv[2] ?? 15000);
const wanted = (process.argv[3] ?? 'home,slow,fast,drifting').split(',');
const perSeason = Number(process.argv[4] ?? 80);

// The pool alternatives (a PA/BF band of x2, with or without the level path) were measured before the
// default pool got its own playing-time floor (half his PA or BF) and did not help; `KINDRED_BENCH_POOLS=1`
// measures them again (three collections per league instead of one).
const POOLS: Record<string, Partial<ProspectOptions>> = {
  'level+age (default)': {},
  ...(process.env['KINDRED_BENCH_POOLS'] === '1' ? { 'PA/BF band x2': { sampleBand: 2 }, 'band x2 + level path': { sampleBand: 2, levelPath: true } } : {}),
};
/**
 * `KINDRED_BENCH_MISSING=1` also forecasts hitters with the comps' missing-dimension rule (missingRuleOf: the
 * imputed gap) beside the prospect default (prospectMissingRuleOf: rescaled).
 */
const HITTER_RULES = process.env['KINDRED_BENCH_MISSING'] === '1';
const HITTER_GROUPS: readonly PositionGroup[] = POSITION_GROUPS.filter((g) => !isPitcherGroup(g));
const D = DEFAULT_CALIBRATION;
/** The default's name in the tables below. */
const DEFAULT_MAP = 'chosen per roster (default)';
/** The former default: the first candidates, fixed. */
const FIXED: CalibrationChoice = { ...D, candidates: [], peakCandidates: [] };
const MAPS: Record<string, CalibrationChoice> = {
  [DEFAULT_MAP]: D,
  'fixed: logistic on comps and PA, blended peak (former default)': FIXED,
  'fixed: logistic on comps only': { ...FIXED, features: ['comps'] },
  'fixed: isotonic on shrunk comps share': { ...FIXED, method: 'isotonic', features: ['comps'] },
  'fixed: + age for the level, level path': { ...FIXED, features: ['comps', 'sample', 'age', 'path'] },
  'fixed: + promotion in the season, PA over all levels': { ...FIXED, features: ['comps', 'seasonSample', 'climb'] },
  'fixed: + his own profile (ridge 40)': { ...FIXED, features: ['comps', 'sample', 'profile'], ridge: 40 },
  'fixed: + his own profile (ridge 100)': { ...FIXED, features: ['comps', 'sample', 'profile'], ridge: 100 },
  'fixed: + his own profile (ridge 250)': { ...FIXED, features: ['comps', 'sample', 'profile'], ridge: 250 },
  'fixed: peak by ridge on comps and profile (40)': { ...FIXED, peak: 'regression', peakFeatures: ['comps', 'profile'] },
  'fixed: scaled conformal score': { ...FIXED, peak: 'scaled' },
  'chosen per roster, probability map only (peak blended)': { ...D, peakCandidates: [] },
};
const ONLY = process.env['KINDRED_BENCH_MAPS']?.split('|');
if (ONLY) for (const name of Object.keys(MAPS)) if (!ONLY.some((o) => name.includes(o)) && name !== DEFAULT_MAP) delete MAPS[name];
const AIMS = { skill: { atLeast: 0.15 }, rho: { atLeast: 0.6 }, cover: { within: [0.75, 0.85] } } as const;

const f = (x: number, d = 3): string => (Number.isFinite(x) ? x.toFixed(d) : '-');
const ci = (w: WithInterval, d = 2): string => `${f(w.value, d)} [${f(w.low, d)}, ${f(w.high, d)}]`;

const oracles = new Map<string, { skill: number; rho: number }[]>();
type Figures = { skill: number; skillM: number; rho: number; cover: number; coverS: number };
const table = new Map<string, Figures[]>();
const add = (key: string, k: KindBacktest): void => {
  const list = table.get(key) ?? [];
  list.push({ skill: k.skillVsLevelAge.value, skillM: k.skillVsMatched.value, rho: k.spearman.value, cover: k.peakCoverage.value, coverS: k.seasonsCoverage.value });
  table.set(key, list);
};

function line(k: KindBacktest): string {
  return [
    `${k.kind.padEnd(7)} n ${String(k.targets).padStart(5)} reached ${f(k.reachedShare, 2)}`,
    `Brier cal ${f(k.brier.calibrated, 4)} comps ${f(k.brier.comps, 4)} matched ${f(k.brier.matched, 4)} lvl-age ${f(k.brier.levelAge, 4)}`,
    `skill vs lvl-age ${ci(k.skillVsLevelAge, 3)} vs matched ${ci(k.skillVsMatched, 3)}`,
    `REL ${f(k.murphy.reliability, 4)} RES ${f(k.murphy.resolution, 4)}`,
    `rho ${ci(k.spearman)} (n ${k.peakTargets})`,
    `peak cover ${ci(k.peakCoverage)} (comps' own ${f(k.peakCoverageRaw, 2)})`,
    `seasons cover ${ci(k.seasonsCoverage)}`,
  ].join('  ');
}

/** The three aimed figures of the default, each with its interval and its aim. */
function aimed(league: string, k: KindBacktest): string {
  return [
    `skill ${ci(k.skillVsLevelAge, 3)} ${aim(`${league} ${k.kind} skill`, k.skillVsLevelAge.value, AIMS.skill)}`,
    `rho ${ci(k.spearman)} ${aim(`${league} ${k.kind} rho`, k.spearman.value, AIMS.rho)}`,
    `peak cover ${ci(k.peakCoverage)} ${aim(`${league} ${k.kind} peak coverage`, k.peakCoverage.value, AIMS.cover)}`,
  ].join('; ');
}

for (const spec of benchLeagues(playerSeasons).filter((s) => wanted.includes(s.name))) {
  await withBenchLeague(spec, async ({ store, storeDir, league, seconds }) => {
    const outcomes = store.outcomes();
    console.log(`\n${spec.name}: ${spec.description}`);
    console.log(`  ${league.truth.length.toLocaleString('en-US')} player-seasons, levels ${league.levels.join(' ')}, ${outcomes.firstSeason}-${outcomes.lastSeason}, built in ${seconds.toFixed(0)} s`);
    for (const [poolName, extra] of Object.entries(POOLS)) {
      const t = performance.now();
      const rows: RawForecast[] = collectForecasts(store, outcomes, {
        prospect: { ...DEFAULT_PROSPECT_OPTIONS, ...extra }, perSeason,
        seasons: [outcomes.firstSeason + 6, outcomes.lastSeason - 6],
      });
      const secs = (performance.now() - t) / 1000;
      if (poolName === 'level+age (default)' && HITTER_RULES) {
        // hitters' prospect comps with the comps' rule (a dimension the comp lacks at its expected gap given his
        // own rates, the lines fitted on the group as of each season); pitchers' rule is the same under both, so
        // their forecasts are shared
        const imputed = collectForecasts(store, outcomes, {
          prospect: { ...DEFAULT_PROSPECT_OPTIONS, comps: { ...DEFAULT_PROSPECT_OPTIONS.comps, missing: 'impute' } }, perSeason,
          seasons: [outcomes.firstSeason + 6, outcomes.lastSeason - 6], groups: HITTER_GROUPS,
        });
        const b = runBacktest([...imputed, ...rows.filter((r) => r.kind === 'pitcher')], outcomes.lastSeason, { horizon: 6, calibration: D, rounds: 300 });
        for (const k of b.kinds.filter((x) => x.kind === 'hitter')) {
          console.log(`  hitters' comps with the imputed gap (the comps' rule), map ${DEFAULT_MAP}: ${line(k)}`);
          add(`hitters with the imputed gap (the comps' rule) | ${DEFAULT_MAP} | ${k.kind}`, k);
        }
      }
      for (const [mapName, choice] of Object.entries(MAPS)) {
        if (poolName !== 'level+age (default)' && mapName !== DEFAULT_MAP) continue;
        const usedChoice: CalibrationChoice = poolName === 'level+age (default)' ? choice : { ...FIXED, features: ['comps', 'matched', 'sample'] };
        const b = runBacktest(rows, outcomes.lastSeason, { horizon: 6, calibration: usedChoice, rounds: 300 });
        console.log(`  pool ${poolName}, map ${mapName}: cuts ${b.cuts.join(',') || 'none'} (${rows.length} forecasts in ${secs.toFixed(0)} s)`);
        if (b.tooShort) console.log(`    ${b.tooShort}`);
        for (const k of b.kinds) {
          console.log(`    ${line(k)}`);
          add(`${poolName} | ${mapName} | ${k.kind}`, k);
          if (poolName === 'level+age (default)' && mapName === DEFAULT_MAP) {
            console.log(`      ${aimed(spec.name, k)}`);
            console.log(`      chosen at each cut: ${k.cuts.map((c) => `${c.cut} ${c.features.includes('profile') ? 'with profile' : 'plain'}, peak ${c.peak}`).join('; ')}`);
            const o = oracle(rows, b.cuts, k.kind, league, store);
            console.log(`      unreachable true-talent reference (the simulator's ceiling value, same rolling origin): skill vs lvl-age ${f(o.skill)}, rho of ceiling with peak ${f(o.rho, 2)}`);
            const list = oracles.get(k.kind) ?? [];
            list.push(o);
            oracles.set(k.kind, list);
          }
        }
      }
    }
  });
}

/**
 * What perfect knowledge of a prospect's true ceiling (the simulator's peakValue) would give under the same
 * rolling origin: a logistic on the ceiling with the level-and-age base rate as offset, fitted at each cut on
 * the training forecasts; and the Spearman of the ceiling with the realised peak. Unreachable for a club.
 */
function oracle(rows: readonly RawForecast[], cuts: readonly number[], kind: string, league: SimLeague, store: ProfileStore): { skill: number; rho: number } {
  const ceiling = (r: RawForecast): number => league.players.peakValue[playerIndexOf(store.players[r.player]?.playerId ?? '')] ?? 0;
  const logit = (p: number): number => Math.log(Math.min(0.99, Math.max(0.01, p)) / (1 - Math.min(0.99, Math.max(0.01, p))));
  const mine = rows.filter((r) => r.kind === kind);
  const fc: number[] = [], base: number[] = [], y: boolean[] = [], peaks: number[] = [], ceil: number[] = [];
  for (const cut of cuts) {
    const training = trainingFor(mine, cut, 6);
    if (training.length < 100) continue;
    const fit = fitLogistic(training.map((r) => [ceiling(r)]), training.map((r) => r.truth?.reached === true), { ridge: 2, penaliseIntercept: true, offsets: training.map((r) => logit(r.levelAge.share)) });
    for (const r of mine.filter((x) => x.season === cut && x.truth !== null)) {
      const b = Number.isFinite(r.levelAge.share) ? r.levelAge.share : 0.15;
      fc.push(logisticProbability(fit, [ceiling(r)], logit(b)));
      base.push(b);
      y.push(r.truth?.reached === true);
      if (r.truth?.peak !== null && r.truth?.peak !== undefined) {
        peaks.push(r.truth.peak);
        ceil.push(kind === 'hitter' ? ceiling(r) : -ceiling(r));
      }
    }
  }
  return { skill: 1 - brierScore(fc, y) / brierScore(base, y), rho: spearmanCorrelation(ceil, peaks) };
}

const mean = (xs: readonly number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
const sd = (xs: readonly number[]): number => Math.sqrt(xs.reduce((a, b) => a + (b - mean(xs)) ** 2, 0) / Math.max(1, xs.length - 1));
const ms = (xs: readonly number[]): string => `${f(mean(xs))} +/- ${f(sd(xs))} (min ${f(Math.min(...xs))})`;
console.log('\nOver leagues (mean +/- sd, min); aims on the defaults (level+age pool, logistic map), mean over leagues: skill vs level-and-age at least 0.15, rho at least 0.60, peak coverage 0.75 to 0.85');
for (const [kind, list] of oracles) console.log(`  true-talent reference, ${kind}: skill vs lvl-age ${ms(list.map((x) => x.skill))}; rho ${ms(list.map((x) => x.rho))}`);
for (const [key, list] of table) {
  console.log(`  ${key}: leagues ${list.length}`);
  console.log(`    skill vs lvl-age ${ms(list.map((x) => x.skill))}; vs matched ${ms(list.map((x) => x.skillM))}`);
  console.log(`    rho ${ms(list.map((x) => x.rho))}; peak cover ${ms(list.map((x) => x.cover))}; seasons cover ${ms(list.map((x) => x.coverS))}`);
  if (key.startsWith(`level+age (default) | ${DEFAULT_MAP} | `)) {
    const kind = key.slice(key.lastIndexOf('|') + 2);
    const skill = mean(list.map((x) => x.skill));
    const rho = mean(list.map((x) => x.rho));
    const cover = mean(list.map((x) => x.cover));
    console.log(`    defaults, ${kind}: skill vs lvl-age ${f(skill)} ${aim(`outlook ${kind}: Brier skill vs level-and-age`, skill, { atLeast: 0.15 })}`);
    console.log(`    defaults, ${kind}: rho of peak p50 ${f(rho, 2)} ${aim(`outlook ${kind}: Spearman of peak p50`, rho, { atLeast: 0.6 })}`);
    console.log(`    defaults, ${kind}: peak p10-p90 coverage ${f(cover, 2)} ${aim(`outlook ${kind}: peak p10-p90 coverage`, cover, { within: [0.75, 0.85] })}`);
  }
}
