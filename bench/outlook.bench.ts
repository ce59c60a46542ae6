/**
 * Honesty check of the prospect outlook on simulated leagues (src/sim), bigger than the one in the tests:
 *   node --import tsx bench/outlook.bench.ts [playerSeasons] [seeds] [configs] [maxTargets]
 * e.g. `... 120000 1,2 25,10,50,25p2 4000`. A config is the number of comps k, with `pN` for --path N.
 *
 * Each target is a minor-league player-season s whose own next 6 seasons are in the data (one per player,
 * see src/outlook/evaluateOutlook.ts). It is forecast from comps with outcomes cut off at s (only comp
 * seasons up to s - 6, whose follow-up had ended by s), then compared with what he did next. The same is
 * done with the level-and-age base rate (every such player-season of the pool, unweighted). Printed side
 * by side, for hitters (peak OPS+, 300+ PA) and pitchers (best FIP-, 50+ IP):
 * - Brier score of reached_mlb (lower is better) and the skill over the base rate, 1 - BS / BS_base;
 * - how often the p10 to p90 range of the peak holds the true peak (aim: about 0.80), among targets with a
 *   qualifying MLB season;
 * - Spearman correlation of the forecast peak p50 with the true peak (higher is better);
 * - the same two for MLB seasons played (the Spearman on the forecast mean).
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../src/build/buildStore.ts';
import { loadProfileStore } from '../src/query/loadProfileStore.ts';
import { loadOutcomes } from '../src/outlook/loadOutcomes.ts';
import { evaluateOutlook, type FigureCheck, type KindEvaluation } from '../src/outlook/evaluateOutlook.ts';
import { DEFAULT_PROSPECT_OPTIONS, type ProspectOptions } from '../src/outlook/findProspectComps.ts';

const playerSeasons = Number(process.argv[2] ?? 120_000);
const seeds = (process.argv[3] ?? '1,2').split(',').map(Number);
const configs = (process.argv[4] ?? '25,10,50,25p2').split(',');
const maxTargets = Number(process.argv[5] ?? 4000);

const fmt = (x: number, digits = 3): string => (Number.isFinite(x) ? x.toFixed(digits) : '-');
const pair = (f: FigureCheck, digits = 3): string => `${fmt(f.comps, digits)} vs ${fmt(f.baseline, digits)}`;

function optionsOf(config: string): ProspectOptions {
  const m = /^(\d+)(?:p(\d+))?$/.exec(config);
  if (!m) throw new Error(`config "${config}": expected k or kpN, e.g. 25 or 25p2`);
  return { ...DEFAULT_PROSPECT_OPTIONS, comps: { ...DEFAULT_PROSPECT_OPTIONS.comps, k: Number(m[1]) }, path: m[2] ? Number(m[2]) : 1 };
}

function row(kind: string, e: KindEvaluation): string {
  const skill = 1 - e.brier.comps / e.brier.baseline;
  return [
    kind.padEnd(8),
    String(e.targets).padStart(6),
    fmt(e.reachedShare, 3).padStart(6),
    `${pair(e.brier, 4)} (${fmt(100 * skill, 1)}%)`.padEnd(26),
    `${pair(e.peakCoverage, 2)} (n ${e.peakCoverage.n})`.padEnd(22),
    pair(e.peakSpearman, 2).padEnd(13),
    pair(e.seasonsCoverage, 2).padEnd(13),
    pair(e.seasonsSpearman, 2),
  ].join('  ');
}

const header = [
  'kind'.padEnd(8),
  'n'.padStart(6),
  'reach'.padStart(6),
  'Brier comps vs base (skill)'.padEnd(26),
  'peak p10-p90 cover'.padEnd(22),
  'peak rho p50'.padEnd(13),
  'seasons cover'.padEnd(13),
  'seasons rho',
].join('  ');

const totals = new Map<string, { brier: number[]; rho: number[]; cover: number[] }>();
for (const seed of seeds) {
  const dir = await mkdtemp(join(tmpdir(), 'kindred-outlook-bench-'));
  try {
    let t = performance.now();
    const league = simulateLeague({ seed, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: playerSeasons });
    await writeLeagueCsv(league, join(dir, 'roster'));
    await buildStore(join(dir, 'roster'), join(dir, 'store'), { lenient: false });
    const store = await loadProfileStore(join(dir, 'store'));
    const outcomes = await loadOutcomes(join(dir, 'store'), store);
    console.log(`\nseed ${seed}: ${league.truth.length.toLocaleString('en-US')} player-seasons ${outcomes.firstSeason}-${outcomes.lastSeason}, built in ${((performance.now() - t) / 1000).toFixed(1)} s`);
    for (const config of configs) {
      t = performance.now();
      const ev = evaluateOutlook(store, outcomes, { prospect: optionsOf(config), maxTargets });
      const n = ev.hitter.targets + ev.pitcher.targets;
      const ms = (performance.now() - t) / Math.max(1, n + ev.withoutComps);
      console.log(`  k ${config}: ${n} targets (${ev.withoutComps} without comps), ${ms.toFixed(1)} ms a target`);
      console.log(`  ${header}`);
      for (const [kind, e] of [['hitters', ev.hitter], ['pitchers', ev.pitcher]] as const) {
        console.log(`  ${row(kind, e)}`);
        const key = `${config} ${kind}`;
        const sum = totals.get(key) ?? { brier: [], rho: [], cover: [] };
        sum.brier.push(1 - e.brier.comps / e.brier.baseline);
        sum.rho.push(e.peakSpearman.comps - e.peakSpearman.baseline);
        sum.cover.push(e.peakCoverage.comps);
        totals.set(key, sum);
      }
    }
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

const mean = (xs: readonly number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
console.log(`\nOver ${seeds.length} league${seeds.length === 1 ? '' : 's'}: Brier skill over the base rate, peak rho gain over the base rate, peak p10-p90 coverage`);
for (const [key, s] of totals) {
  const beats = mean(s.brier) > 0 && mean(s.rho) > 0 ? 'beats the base rate on both' : 'does NOT beat the base rate on both';
  console.log(`  k ${key.padEnd(14)} skill ${fmt(100 * mean(s.brier), 1)}%  rho +${fmt(mean(s.rho), 2)}  cover ${fmt(mean(s.cover), 2)}  (${beats})`);
}
