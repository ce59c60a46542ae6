/**
 * Load test of `kindred serve`: GET /api/comps on the demo store, 20 connections for 20 seconds
 * (autocannon), rotating over player-seasons of every position group. The server runs as its own
 * process (`node bin/kindred.js serve --port 0`), as a user would start it; autocannon runs here.
 * Runs twice: with the server's default answer cache (the 400 targets fit in it, so after the
 * first round every answer is a hit) and with `--cache 0` (every request computed).
 * Prints p50 and p99 latency, requests per second, errors and non-2xx answers.
 * `node --import tsx bench/serve.bench.ts [connections] [seconds]`
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { aim } from './lib/aim.ts';
import { serveUnderLoad } from './lib/serveUnderLoad.ts';
import { buildStore } from '../src/pipeline/buildStore.ts';
import { DEMO_ROSTER } from '../src/cli/commands/demoCommand.ts';
import { openProfileStore } from '../src/store/openProfileStore.ts';

const connections = Number(process.argv[2] ?? 20);
const seconds = Number(process.argv[3] ?? 20);
/** Distinct targets cycled through, spread over the groups in proportion to their size. */
const TARGETS = 400;

const dir = await mkdtemp(join(tmpdir(), 'kindred-serve-bench-'));
const storeDir = join(dir, 'store');
await buildStore(DEMO_ROSTER, storeDir, { lenient: false });
const store = await openProfileStore(storeDir);
const paths: string[] = [];
const total = [...store.groups.values()].reduce((a, g) => a + g.n, 0);
for (const g of store.groups.values()) {
  const want = Math.max(1, Math.round((TARGETS * g.n) / total));
  for (let i = 0; i < want; i++) {
    const row = Math.floor(((i + 0.5) * g.n) / want);
    const p = store.players[g.player[row] as number];
    if (!p) continue;
    const q = new URLSearchParams({
      player: p.playerId,
      season: String(g.season[row]),
      level: store.levels[g.level[row] as number] ?? '',
      position: g.position[row] ?? 'DH',
    });
    paths.push(`/api/comps?${q.toString()}`);
  }
}

async function run(label: string, extraArgs: string[]): Promise<void> {
  const result = await serveUnderLoad({ storeDir, serveArgs: extraArgs, paths, connections, seconds });
  const line = (k: string, v: string): void => console.log(`  ${k.padEnd(22)} ${v}`);
  console.log(`${label}:`);
  line('latency p50', `${result.latency.p50} ms`);
  line('latency p99', `${result.latency.p99} ms ${aim(`${label}: p99`, result.latency.p99, { below: 50, unit: 'ms' })}`);
  line('latency max', `${result.latency.max} ms`);
  line('requests / s (mean)', result.requests.average.toFixed(0));
  line('requests', String(result.requests.total));
  line('errors', `${result.errors} ${aim(`${label}: errors`, result.errors, { below: 1 })}`);
  line('timeouts', `${result.timeouts} ${aim(`${label}: timeouts`, result.timeouts, { below: 1 })}`);
  line('non-2xx', `${result.non2xx} ${aim(`${label}: non-2xx answers`, result.non2xx, { below: 1 })}`);
}

console.log(`kindred serve: GET /api/comps on the demo store (${total} player-seasons), ${paths.length} targets, ${connections} connections, ${seconds} s each`);
try {
  await run('default answer cache', []);
  await run('no cache (--cache 0)', ['--cache', '0']);
} finally {
  await rm(dir, { recursive: true, force: true });
}
