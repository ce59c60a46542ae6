/**
 * Load test of `kindred serve`: GET /api/comps on the demo store (or a store folder given, served
 * read-only), 20 connections for 20 seconds (autocannon), rotating over player-seasons of every
 * position group. The server runs as its own process (`node bin/kindred.js serve --port 0`), as a
 * user would start it; autocannon runs here.
 * Runs seven times: with the server's default answer cache (the 400 targets fit in it, so after the
 * first round every answer is a hit); with `--cache 0` (every request computed) and 0, 1 and 2 answer
 * workers (`--workers`), at `connections`; `--cache 0` with `POST /api/reload` every 0.3 s beside the
 * load (each reload opens the store again, the unchanged groups taken over, in the server and in
 * every worker, and swaps it in); and both caches at 200 connections. Without `--workers` the
 * server's default is used (DEFAULT_WORKERS). With a store folder given, every target is asked once
 * before each run, so that each worker has read its groups (at 1M a group takes seconds to read).
 * Prints p50 and p99 latency, requests per second, errors and non-2xx answers, each with its aim
 * (bench/lib/aim.ts): `--cache 0` p99 at most 20 ms, under reloads at most 50 ms, at 200 connections
 * under 500 ms; no errors, timeouts or non-2xx answers anywhere; and the server's resident memory
 * at the end of each run and its peak.
 * `node --import tsx bench/serve.bench.ts [connections] [seconds] [store folder]`
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

const given = process.argv[4];
const dir = await mkdtemp(join(tmpdir(), 'kindred-serve-bench-'));
const storeDir = given ?? join(dir, 'store');
if (given === undefined) await buildStore(DEMO_ROSTER, storeDir, { lenient: false });
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

/** Reloads through the API every `everyMs` until stopped; counts the answers by status. */
function reloadEvery(everyMs: number, counts: Map<number | string, number>): (url: string) => () => Promise<void> {
  return (url) => {
    let stopped = false;
    const origin = new URL(url).origin;
    const loop = (async () => {
      while (!stopped) {
        const res = await fetch(new URL('/api/reload', url), { method: 'POST', headers: { Origin: origin } }).then(
          async (r) => {
            await r.arrayBuffer();
            return r.status;
          },
          (e: unknown) => (e instanceof Error ? e.message : String(e)),
        );
        counts.set(res, (counts.get(res) ?? 0) + 1);
        await new Promise((r) => setTimeout(r, everyMs));
      }
    })();
    return async () => {
      stopped = true;
      await loop;
    };
  };
}

async function run(label: string, extraArgs: string[], p99Aim: number, conns = connections, reloadMs?: number): Promise<void> {
  const reloads = new Map<number | string, number>();
  const result = await serveUnderLoad({
    storeDir, serveArgs: extraArgs, paths, connections: conns, seconds, warmAll: given !== undefined,
    ...(reloadMs === undefined ? {} : { beside: reloadEvery(reloadMs, reloads) }),
  });
  const line = (k: string, v: string): void => console.log(`  ${k.padEnd(22)} ${v}`);
  console.log(`${label}:`);
  line('latency p50', `${result.latency.p50} ms`);
  line('latency p99', `${result.latency.p99} ms ${aim(`${label}: p99`, result.latency.p99, { within: [0, p99Aim], unit: 'ms' })}`);
  line('latency max', `${result.latency.max} ms`);
  line('requests / s (mean)', result.requests.average.toFixed(0));
  line('requests', String(result.requests.total));
  line('errors', `${result.errors} ${aim(`${label}: errors`, result.errors, { below: 1 })}`);
  line('timeouts', `${result.timeouts} ${aim(`${label}: timeouts`, result.timeouts, { below: 1 })}`);
  line('non-2xx', `${result.non2xx} ${aim(`${label}: non-2xx answers`, result.non2xx, { below: 1 })}`);
  line('server memory', `RSS ${result.memory.rssMiB ?? '?'} MiB at the end, peak ${result.memory.peakMiB ?? '?'} MiB`);
  if (reloadMs !== undefined) {
    const total = [...reloads.values()].reduce((a, b) => a + b, 0);
    const failed = total - (reloads.get(200) ?? 0);
    line('reloads', `${total} (every ${reloadMs} ms), ${failed} not answered 200 ${aim(`${label}: failed reloads`, failed, { below: 1 })}`);
  }
}

const where = given === undefined ? 'the demo store' : storeDir;
console.log(`kindred serve: GET /api/comps on ${where} (${total} player-seasons), ${paths.length} targets, ${connections} connections, ${seconds} s each`);
try {
  await run('default answer cache', [], 50);
  await run('no cache (--cache 0), answers on the server\'s thread (--workers 0)', ['--cache', '0', '--workers', '0'], 20);
  await run('no cache, 1 answer worker (--workers 1)', ['--cache', '0', '--workers', '1'], 20);
  await run('no cache, 2 answer workers (--workers 2)', ['--cache', '0', '--workers', '2'], 20);
  await run('no cache, reload every 0.3 s', ['--cache', '0'], 50, connections, 300);
  await run('default answer cache, 200 connections', [], 500, 200);
  await run('no cache, 200 connections', ['--cache', '0'], 500, 200);
} finally {
  await rm(dir, { recursive: true, force: true });
}
