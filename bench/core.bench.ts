/**
 * Core figures on simulated leagues: build time and peak memory, store load time, comps latency
 * (p50, p99) in batch mode with HNSW and with --exact, and recall@10 of HNSW against --exact.
 * `node --import tsx bench/core.bench.ts [playerSeasons ...]` (default 100000 1000000).
 */
import { execFileSync } from 'node:child_process';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { loadProfileStore } from '../src/query/loadProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS, findComps } from '../src/query/findComps.ts';
import { playerTarget } from '../src/query/playerTarget.ts';
import type { ProfileStore } from '../src/query/ProfileStore.ts';
import type { TargetRow } from '../src/query/selectTargetRow.ts';
import { nearestRankQuantile } from '../src/stats/quantile.ts';

/** Latency percentile by nearest rank. */
const p = (times: readonly number[], q: number): number => nearestRankQuantile([...times].sort((a, b) => a - b), q);

const sizes = process.argv.slice(2).map(Number).filter((n) => n > 0);

/** Targets with every dimension present, spread over the groups in proportion to their size. */
function sampleTargets(store: ProfileStore, count: number): TargetRow[] {
  const total = [...store.groups.values()].reduce((a, g) => a + g.n, 0);
  const out: TargetRow[] = [];
  for (const [group, g] of store.groups) {
    const want = Math.max(1, Math.round((count * g.n) / total));
    const full: number[] = [];
    for (let r = 0; r < g.n; r++) if (g.z.subarray(r * g.d, (r + 1) * g.d).every((v) => !Number.isNaN(v))) full.push(r);
    for (let i = 0; i < want && full.length > 0; i++) out.push({ group, row: full[Math.floor(((i + 0.5) * full.length) / want)] as number });
  }
  return out;
}

async function one(n: number): Promise<string[]> {
  const dir = await mkdtemp(join(tmpdir(), 'kindred-bench-'));
  const lines: string[] = [];
  try {
    let t = performance.now();
    const league = simulateLeague({ seed: 2024, firstSeason: 1975, lastSeason: 2026, targetPlayerSeasons: n });
    const files = await writeLeagueCsv(league, join(dir, 'roster'));
    const rows = Object.values(files.files).reduce((a, b) => a + b, 0);
    lines.push(`${n.toLocaleString('en-US')} player-seasons: simulated and written (${rows.toLocaleString('en-US')} CSV rows) in ${((performance.now() - t) / 1000).toFixed(1)} s`);
    const out = execFileSync(process.execPath, ['--import', 'tsx', join(import.meta.dirname, 'lib/buildChild.ts'), join(dir, 'roster'), join(dir, 'store')], {
      encoding: 'utf8',
      maxBuffer: 1 << 24,
    });
    const build = JSON.parse(out.trim().split('\n').pop() ?? '{}') as { seconds: number; maxRssMb: number; profiles: number };
    lines.push(`  build: ${build.seconds.toFixed(1)} s, peak memory ${build.maxRssMb.toFixed(0)} MB, ${build.profiles.toLocaleString('en-US')} profiles (aim: 1M in under 180 s and 2048 MB)`);
    t = performance.now();
    const store = await loadProfileStore(join(dir, 'store'));
    lines.push(`  store load: ${((performance.now() - t) / 1000).toFixed(2)} s`);
    const targets = sampleTargets(store, 400);
    const fast: number[] = [];
    const exactTimes: number[] = [];
    let hits = 0;
    let total = 0;
    let viaIndex = 0;
    targets.forEach((at, i) => {
      const target = playerTarget(store, at);
      let s = performance.now();
      const a = findComps(store, target, DEFAULT_COMPS_OPTIONS);
      fast.push(performance.now() - s);
      if (a.query.method === 'hnsw') viaIndex++;
      if (i % 4 === 0) {
        s = performance.now();
        const b = findComps(store, target, { ...DEFAULT_COMPS_OPTIONS, exact: true });
        exactTimes.push(performance.now() - s);
        const truth = new Set(b.comps.map((c) => c.player_id));
        hits += a.comps.filter((c) => truth.has(c.player_id)).length;
        total += truth.size;
      }
    });
    lines.push(`  comps latency, HNSW (${viaIndex} of ${targets.length} targets via the index): p50 ${p(fast, 0.5).toFixed(2)} ms, p99 ${p(fast, 0.99).toFixed(2)} ms (aim: p50 under 2 ms)`);
    lines.push(`  comps latency, --exact (${exactTimes.length} targets): p50 ${p(exactTimes, 0.5).toFixed(2)} ms, p99 ${p(exactTimes, 0.99).toFixed(2)} ms`);
    lines.push(`  recall@10 of HNSW against --exact: ${(hits / total).toFixed(4)} (aim: at least 0.99)`);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
  return lines;
}

for (const n of sizes.length > 0 ? sizes : [100_000, 1_000_000]) {
  for (const line of await one(n)) console.log(line);
}
