/**
 * Core figures on simulated leagues, as an analyst meets them: build time and peak memory (index
 * builds in worker threads), store open time, the wall time of one cold `kindred comps <player>` from
 * the shell, batch comps latency (p50, p99) and recall@10 against --exact per coverage class for
 * targets drawn uniformly from all player-seasons (tracked or not, every group) plus `--want`
 * profiles of 2 to 6 dimensions, and `kindred serve` latency without the answer cache.
 * `node --import tsx bench/core.bench.ts [playerSeasons ...]` (default 100000 1000000), or
 * `node --import tsx bench/core.bench.ts --store <dir>` to measure a store already built (everything but the build).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { openProfileStore } from '../src/store/openProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS, findComps } from '../src/query/findComps.ts';
import { playerTarget } from '../src/query/playerTarget.ts';
import { COVERAGE_CLASSES, drawTargets, type CoverageClass, type DrawnTarget } from './lib/drawTargets.ts';
import { windowView } from '../src/query/windowView.ts';
import { DEFAULT_WINDOW } from '../src/query/defaultWindow.ts';
import type { ProfileStore } from '../src/store/ProfileStore.ts';
import { nearestRankQuantile } from '../src/stats/quantile.ts';
import { aim } from './lib/aim.ts';
import { serveUnderLoad } from './lib/serveUnderLoad.ts';

/** Latency percentile (0..100) by nearest rank. */
const percentile = (times: readonly number[], q: number): number => nearestRankQuantile([...times].sort((a, b) => a - b), q / 100);

const args = process.argv.slice(2);
const storeAt = args.indexOf('--store');
/** A store already built, measured as it is (`--store <dir>`), instead of simulating and building leagues. */
const givenStore = storeAt >= 0 ? args[storeAt + 1] : undefined;
const sizes = args.map(Number).filter((n) => n > 0);
const root = fileURLToPath(new URL('..', import.meta.url));
const kindred = join(root, 'bin', 'kindred.js');
/** Batch targets per league (a fifth of them --want profiles), after 100 warm-up queries. */
const TARGETS = 1000;
const WANT_SHARE = 0.2;

const ms = (x: number): string => `${x.toFixed(2)} ms`;
/** CPU seconds (user + system) of this process since `from`. */
const cpuSince = (from: NodeJS.CpuUsage): number => {
  const u = process.cpuUsage(from);
  return (u.user + u.system) / 1e6;
};
/** CPU seconds used by this process's finished children so far (getrusage RUSAGE_CHILDREN, through /proc). */
function childCpuSeconds(): number {
  const fields = readFileSync('/proc/self/stat', 'utf8').split(') ')[1]?.split(' ') ?? [];
  // fields 16 and 17 of proc(5), cutime and cstime, in clock ticks (100 a second on Linux)
  return (Number(fields[13] ?? 0) + Number(fields[14] ?? 0)) / 100;
}

async function one(n: number): Promise<string[]> {
  const dir = await mkdtemp(join(tmpdir(), 'kindred-bench-'));
  const lines: string[] = [];
  const say = (line: string): void => {
    lines.push(line);
    console.log(line);
  };
  try {
    let t = performance.now();
    const league = simulateLeague({ seed: 2024, firstSeason: 1975, lastSeason: 2026, targetPlayerSeasons: n });
    const files = await writeLeagueCsv(league, join(dir, 'roster'));
    const rows = Object.values(files.files).reduce((a, b) => a + b, 0);
    say(`${n.toLocaleString('en-US')} player-seasons: simulated and written (${rows.toLocaleString('en-US')} CSV rows) in ${((performance.now() - t) / 1000).toFixed(1)} s`);
    const storeDir = join(dir, 'store');
    const out = execFileSync(process.execPath, ['--import', 'tsx', join(import.meta.dirname, 'lib/buildChild.ts'), join(dir, 'roster'), storeDir], {
      encoding: 'utf8',
      maxBuffer: 1 << 24,
    });
    const build = JSON.parse(out.trim().split('\n').pop() ?? '{}') as { seconds: number; cpuSeconds: number; maxRssMb: number; profiles: number; threads: number };
    say(`  build: ${build.seconds.toFixed(1)} s wall, ${build.cpuSeconds.toFixed(1)} s CPU (all threads), peak memory ${build.maxRssMb.toFixed(0)} MB, ${build.profiles.toLocaleString('en-US')} profiles, indexes in ${build.threads} worker threads${n >= 1_000_000 ? ` ${aim(`build time at ${n}`, build.seconds, { below: 60, unit: 's' })} ${aim(`build peak memory at ${n}`, build.maxRssMb, { below: 1536, unit: 'MB' })}` : ''}`);

    lines.push(...(await measure(storeDir, n)));
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
  return lines;
}

/** Everything but the build, on the store in `storeDir` (`n` player-seasons, for the aims at 1,000,000). */
async function measure(storeDir: string, n: number): Promise<string[]> {
  const lines: string[] = [];
  const say = (line: string): void => {
    lines.push(line);
    console.log(line);
  };
  {
    let t = performance.now();
    let c0 = process.cpuUsage();
    const store = await openProfileStore(storeDir);
    const openS = (performance.now() - t) / 1000;
    const openCpu = cpuSince(c0);
    // the first query reads the target's group (rows, matrices, indexes), verifying each file once
    const firstGroup = [...store.groups.keys()].sort((a, b) => (store.groups.get(b)?.n ?? 0) - (store.groups.get(a)?.n ?? 0))[0];
    t = performance.now();
    c0 = process.cpuUsage();
    if (firstGroup) findComps(store, playerTarget(store, { group: firstGroup, row: 0 }), DEFAULT_COMPS_OPTIONS);
    say(`  store open (in this process, lazy): ${openS.toFixed(2)} s wall, ${openCpu.toFixed(2)} s CPU${n >= 1_000_000 ? ` ${aim(`store open at ${n}`, openS, { below: 1, unit: 's' })}` : ''}; first query in the largest group (${firstGroup ?? '-'}, reads it): ${((performance.now() - t) / 1000).toFixed(2)} s wall, ${cpuSince(c0).toFixed(2)} s CPU`);

    // one cold command from the shell, as a user types it: median of 3
    const someone = store.players[[...store.groups.values()][0]?.player[0] ?? 0]?.playerId ?? '';
    const cold: number[] = [];
    const coldCpu: number[] = [];
    for (let i = 0; i < 3; i++) {
      const s = performance.now();
      const before = childCpuSeconds();
      const run = spawnSync(process.execPath, [kindred, 'comps', someone, '--store', storeDir, '--format', 'json'], { encoding: 'utf8', maxBuffer: 1 << 24 });
      cold.push(performance.now() - s);
      coldCpu.push(childCpuSeconds() - before);
      if (run.status !== 0) throw new Error(`kindred comps failed: ${run.stderr}`);
    }
    const coldS = percentile(cold, 50) / 1000;
    say(`  cold \`kindred comps <player>\` from the shell: ${coldS.toFixed(2)} s wall, ${percentile(coldCpu, 50).toFixed(2)} s CPU, median of 3${n >= 1_000_000 ? ` ${aim(`cold comps from the shell at ${n}`, coldS, { below: 1.5, unit: 's' })}` : ''}`);

    const drawn = drawTargets(store, TARGETS + 100, WANT_SHARE, 17);
    // single seasons, then the default window (what `kindred comps` answers when none is asked for)
    for (const window of [1, DEFAULT_WINDOW]) {
      if (window !== 1 && !store.windows.has(window)) continue;
      say(`  over ${window === 1 ? 'single seasons' : `windows of ${window} seasons (the default)`}:`);
      batch(windowView(store, window), window === 1 ? drawn : drawTargets(windowView(store, window), TARGETS + 100, WANT_SHARE, 17), n, window, say);
    }
    const paths = drawn
      .filter((d) => d.target.kind === 'player')
      .slice(0, 400)
      .map(({ target }) => {
        const p = store.players[target.player];
        const q = new URLSearchParams({ player: p?.playerId ?? '', season: String(target.season), level: target.level ?? '', position: target.position });
        return `/api/comps?${q.toString()}`;
      });
    const served = await serveLoad(storeDir, paths, 20, 10);
    say(`  kindred serve --cache 0, 20 connections, 10 s, ${paths.length} player targets: p50 ${served.p50} ms, p99 ${served.p99} ms, ${served.requests} requests, ${served.errors} errors, ${served.non2xx} non-2xx ${aim(`serve p99 at ${n}`, served.p99, { below: 20, unit: 'ms' })} ${aim(`serve errors at ${n}`, served.errors, { below: 1 })}`);
  }
  return lines;
}

/** Batch comps for `drawn` (the first 100 warm up): latency per coverage class and recall@10 against --exact. */
function batch(store: ProfileStore, drawn: readonly DrawnTarget[], n: number, window: number, say: (line: string) => void): void {
  for (const { target } of drawn.slice(0, 100)) findComps(store, target, DEFAULT_COMPS_OPTIONS);
  const by = new Map<CoverageClass, { fast: number[]; exact: number[]; hits: number; total: number; viaIndex: number }>();
  const all: number[] = [];
  /** CPU time of each query (this process's, one thread): what the query costs, without the waits of a shared machine. */
  const cpu: number[] = [];
  for (const { target, coverage } of drawn.slice(100)) {
    const c0 = process.cpuUsage();
    let s = performance.now();
    const a = findComps(store, target, DEFAULT_COMPS_OPTIONS);
    const took = performance.now() - s;
    const used = process.cpuUsage(c0);
    cpu.push((used.user + used.system) / 1000);
    s = performance.now();
    const b = findComps(store, target, { ...DEFAULT_COMPS_OPTIONS, exact: true });
    const tookExact = performance.now() - s;
    const e = by.get(coverage) ?? { fast: [], exact: [], hits: 0, total: 0, viaIndex: 0 };
    by.set(coverage, e);
    e.fast.push(took);
    all.push(took);
    e.exact.push(tookExact);
    if (a.query.method === 'hnsw') e.viaIndex++;
    const truth = new Set(b.comps.map((c) => c.player_id));
    e.hits += a.comps.filter((c) => truth.has(c.player_id)).length;
    e.total += truth.size;
  }
  say(`  batch comps, k 10, ${all.length} targets drawn uniformly: p50 ${ms(percentile(all, 50))}, p99 ${ms(percentile(all, 99))}${n >= 1_000_000 ? ` p50 ${aim(`comps p50 at ${n}${window === 1 ? '' : `, window ${window}`}`, percentile(all, 50), { below: 2, unit: 'ms' })} p99 ${aim(`comps p99 at ${n}${window === 1 ? '' : `, window ${window}`}`, percentile(all, 99), { below: 10, unit: 'ms' })}` : ''}; CPU time p50 ${ms(percentile(cpu, 50))}, p99 ${ms(percentile(cpu, 99))}`);
  say(`    ${'coverage class'.padEnd(30)} ${'targets'.padStart(7)} ${'via index'.padStart(9)} ${'p50'.padStart(9)} ${'p99'.padStart(9)} ${'exact p50'.padStart(10)} ${'exact p99'.padStart(10)}  recall@10`);
  for (const c of COVERAGE_CLASSES) {
    const e = by.get(c);
    if (!e) continue;
    say(
      `    ${c.padEnd(30)} ${String(e.fast.length).padStart(7)} ${String(e.viaIndex).padStart(9)} ${ms(percentile(e.fast, 50)).padStart(9)} ${ms(percentile(e.fast, 99)).padStart(9)} ${ms(percentile(e.exact, 50)).padStart(10)} ${ms(percentile(e.exact, 99)).padStart(10)}  ${(e.hits / e.total).toFixed(4)} ${aim(`recall@10 (${c}) at ${n}${window === 1 ? '' : `, window ${window}`}`, e.hits / e.total, { atLeast: 0.99 })}`,
    );
  }

}

/** `kindred serve` without the answer cache under load (default answer workers; every target asked once first, so each worker has read its groups): latency and failures. */
async function serveLoad(storeDir: string, paths: string[], connections: number, seconds: number): Promise<{ p50: number; p99: number; requests: number; errors: number; non2xx: number }> {
  const r = await serveUnderLoad({ storeDir, serveArgs: ['--cache', '0'], paths, connections, seconds, warmAll: true });
  return { p50: r.latency.p50, p99: r.latency.p99, requests: r.requests.total, errors: r.errors + r.timeouts, non2xx: r.non2xx };
}

// the cold command and the server run the compiled CLI: compile it first, or they would time the sources run through tsx
execFileSync('npm', ['run', '--silent', 'build:cli'], { cwd: root, stdio: 'inherit' });
console.log('Figures are wall times on this machine; when it is shared they include the other users\' load.');
if (givenStore) {
  const store = await openProfileStore(givenStore);
  const n = [...store.groups.values()].reduce((a, g) => a + g.n, 0);
  console.log(`${givenStore}: ${n.toLocaleString('en-US')} profiles (single seasons), measured as built`);
  await measure(givenStore, n);
} else for (const n of sizes.length > 0 ? sizes : [100_000, 1_000_000]) await one(n);
