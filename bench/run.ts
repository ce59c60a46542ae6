/**
 * `npm run bench`: every bench of the project, one after another, each in its own process so that
 * memory figures are its own. Pass names to run a subset: `npm run bench -- core quality`.
 * Figures are printed with their aims (bench/lib/aim.ts), not timed in tests. With `--check`, each
 * figure is compared with its aim and the run exits non-zero when one is missed (or a bench fails):
 * `npm run bench -- --check core serve`.
 */
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { CHECK_ENV, MISSED_AIM_EXIT } from './lib/aim.ts';

const BENCHES: readonly { name: string; file: string; args: readonly string[]; what: string }[] = [
  { name: 'core', file: 'core.bench.ts', args: ['100000', '1000000'], what: 'build, load, comps latency and recall at 100k and 1M player-seasons' },
  { name: 'quality', file: 'compsQuality.bench.ts', args: ['30000'], what: 'comps quality: plain z-scores against the default weights' },
  { name: 'quality', file: 'poolQuality.bench.ts', args: ['30000', '4', '30'], what: 'comps quality by pool: the whole group, his level, the default pool rules (position, levels within one, half his playing time), with adjacent positions' },
  { name: 'quality', file: 'shrinkageQuality.bench.ts', args: ['30000', '120'], what: 'comps quality by case (top-level hitters 400+ PA, SP 500+ BF, RP 150+ BF): fixed-table against fitted shrinkage' },
  { name: 'quality', file: 'qualityCases.bench.ts', args: ['30000', '120', '4', '60'], what: 'comps quality cases and aims (top-level hitters 400+ PA, SP 500+ BF, RP 150+ BF, planted twins found in the top 10) by profile window (1, 3, 5 seasons), default pool rules' },
  { name: 'quality', file: 'pitcherQuality.bench.ts', args: ['30000', '80', '4', '1,3'], what: 'why pitchers\u2019 comps are further from the ideal: dimension weights, tracked against untracked seasons, true talents missed, weight and missing-value variants' },
  { name: 'quality', file: 'hitterGaps.bench.ts', args: ['30000', '120', '4', '5'], what: 'why hitters\u2019 comps miss arm, speed and glove: per dimension its weight, reliability, share missing and correlation with each true talent; talent spread by position; talent gaps with and without the arm and run-speed measurements' },
  { name: 'quality', file: 'embedLeagueQuality.bench.ts', args: ['20000', 'autoencoder,cross-season,cross-season-linear', '4', '40'], what: 'learned spaces (plain and cross-season autoencoders, the linear variant) against the input space at every level of the standard leagues' },
  { name: 'index', file: 'index.bench.ts', args: [], what: 'HNSW against brute force on random vectors' },
  { name: 'embed', file: 'embed.bench.ts', args: [], what: 'autoencoder training time at 100,000 rows' },
  { name: 'embed-quality', file: 'embedQuality.bench.ts', args: ['30000', 'none,pca,autoencoder'], what: 'comps quality in the input, PCA and autoencoder spaces' },
  { name: 'outlook', file: 'outlook.bench.ts', args: [], what: 'prospect outlook calibration, Brier score and rank correlation against the base rate' },
  { name: 'serve', file: 'serve.bench.ts', args: ['20', '20'], what: 'HTTP load on the comps endpoint (20 connections, 20 s each: default cache, --cache 0, --cache 0 with reloads every 0.3 s; then 200 connections)' },
  { name: 'fuzz', file: 'fuzz.bench.ts', args: [], what: 'fuzzing: 10,000 store and 10,000 roster mutants, command lines and API requests, each in a child process' },
];

const check = process.argv.includes('--check');
const wanted = process.argv.slice(2).filter((a) => a !== '--check');
const unknown = wanted.filter((w) => !BENCHES.some((b) => b.name === w));
if (unknown.length > 0) {
  console.error(`unknown bench ${unknown.join(', ')}; known: ${BENCHES.map((b) => b.name).join(', ')}`);
  process.exitCode = 2;
} else {
  const failed: string[] = [];
  const missed: string[] = [];
  for (const b of BENCHES) {
    if (wanted.length > 0 && !wanted.includes(b.name)) continue;
    console.log(`\n== ${b.name}: ${b.what}`);
    const started = performance.now();
    const env = { ...process.env, [CHECK_ENV]: check ? '1' : '0' };
    const run = spawnSync(process.execPath, ['--import', 'tsx', join(import.meta.dirname, b.file), ...b.args], { stdio: 'inherit', env });
    const seconds = ((performance.now() - started) / 1000).toFixed(0);
    if (run.status === MISSED_AIM_EXIT) {
      missed.push(b.name);
      console.log(`-- ${b.name} missed an aim (listed above) after ${seconds} s`);
    } else if (run.status !== 0) {
      failed.push(b.name);
      console.log(`-- ${b.name} failed (exit ${run.status ?? run.signal}) after ${seconds} s`);
    } else console.log(`-- ${b.name} done in ${seconds} s`);
  }
  if (check) console.log(`\naims: ${missed.length === 0 && failed.length === 0 ? 'all met' : `missed in ${missed.join(', ') || 'none'}; failed: ${failed.join(', ') || 'none'}`}`);
  if (failed.length > 0 || missed.length > 0) process.exitCode = 1;
}
