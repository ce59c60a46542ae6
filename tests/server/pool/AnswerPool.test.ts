import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rename, symlink } from 'node:fs/promises';
import { join } from 'node:path';
import { createServer, type RunningServer } from '../../../src/server/createServer.ts';
import { loadServedStore } from '../../../src/server/loadServedStore.ts';
import { openProfileStore } from '../../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../../src/store/ProfileStore.ts';
import { DEFAULT_PROFILE_OPTIONS } from '../../../src/profiles/buildProfiles.ts';
import { scratchDir } from '../../helpers/scratchDir.ts';
import { buildDemoStore } from '../serverFixture.ts';

let root = '';
/** The demo store, and one built with much higher sample minimums (fewer profiles: other answers). */
let storeA = '';
let storeB = '';
let paths: string[] = [];

/** Request paths over every store endpoint: comps over every group, the other jobs, and refusals. */
function requestPaths(store: ProfileStore): string[] {
  const out: string[] = [];
  for (const g of store.groups.values()) {
    for (let i = 0; i < 6; i++) {
      const row = Math.floor(((i + 0.5) * g.n) / 6);
      const p = store.players[g.player[row] ?? -1];
      const other = store.players[g.player[(row + 11) % g.n] ?? -1];
      if (!p || !other) continue;
      const q = new URLSearchParams({ player: p.playerId, season: String(g.season[row]), level: store.levels[g.level[row] ?? -1] ?? '', position: g.position[row] ?? 'DH' });
      out.push(`/api/comps?${q.toString()}`);
      if (i === 0) out.push(`/api/map?group=${g.group}`, `/api/players?q=${encodeURIComponent(p.name.slice(0, 4))}`, `/api/comps?player=${p.playerId}&k=25&exact`, `/api/prospect?player=${p.playerId}`, `/api/cheaper?player=${p.playerId}&max-salary=2000000`, `/api/match?player=${p.playerId}&candidate=${other.playerId}`);
    }
  }
  out.push('/api/info', '/api/map?group=hitters', '/api/players?q=zz', '/api/comps?want=obp%3D60g&position=SS', '/api/comps?player=nobody', '/api/comps?k=0', '/api/comps?player=p000202&bogus=1', '/api/prospect?player=nobody');
  return out;
}

interface Answer {
  readonly status: number;
  readonly type: string | null;
  readonly text: string;
}

/** The answer to `path`; `/api/info` without its load time (each server loaded its store at its own time). */
async function get(srv: RunningServer, path: string): Promise<Answer> {
  const r = await fetch(new URL(path, srv.url));
  const text = await r.text();
  return { status: r.status, type: r.headers.get('content-type'), text: path === '/api/info' ? text.replace(/"loaded_at":"[^"]*"/, '"loaded_at":""') : text };
}

/** Points the symlink `link` at `target` in one step (a new link renamed over the old). */
async function pointAt(link: string, target: string): Promise<void> {
  const temp = `${link}.next`;
  await symlink(target, temp);
  await rename(temp, link);
}

beforeAll(async () => {
  root = await scratchDir('kindred-pool-');
  storeA = join(root, 'a');
  storeB = join(root, 'b');
  await buildDemoStore(storeA);
  await buildDemoStore(storeB, { profile: { ...DEFAULT_PROFILE_OPTIONS, minimums: { minPa: 150, minBf: 150 } } });
  paths = requestPaths(await openProfileStore(storeA));
});

/** Every answer of `paths` from a server on `storeDir` answering on its own thread, without a cache. */
async function inThreadAnswers(storeDir: string): Promise<Map<string, Answer>> {
  const srv = await createServer({ storeDir, port: 0, cacheEntries: 0, workers: 0, log: () => {} });
  try {
    const out = new Map<string, Answer>();
    for (const p of paths) out.set(p, await get(srv, p));
    return out;
  } finally {
    await srv.close();
  }
}

let expectedA = new Map<string, Answer>();
let expectedB = new Map<string, Answer>();
beforeAll(async () => {
  expectedA = await inThreadAnswers(storeA);
  expectedB = await inThreadAnswers(storeB);
});

afterAll(() => undefined);

describe('AnswerPool: worker threads answering store endpoints', () => {
  it('answers every store endpoint byte for byte as the server\'s own thread does (answers and refusals)', async () => {
    const srv = await createServer({ storeDir: storeA, port: 0, cacheEntries: 0, workers: 2, log: () => {} });
    try {
      expect(srv.pool?.size).toBe(2);
      const got = await Promise.all(paths.map((p) => get(srv, p)));
      const statuses = new Set(got.map((a) => a.status));
      expect([...statuses].sort(), 'answers and refusals both compared').toEqual([200, 400, 404]);
      got.forEach((a, i) => expect(a, paths[i]).toEqual(expectedA.get(paths[i] ?? '')));
      const reloaded = await fetch(new URL('/api/reload', srv.url), { method: 'POST' });
      expect(reloaded.status).toBe(200);
      expect(JSON.parse(await reloaded.text())).toMatchObject({ generation: 2 });
      const opened = srv.holder.current.store.opened;
      const groupFiles = Object.keys(opened.manifest.files).filter((f) => f.startsWith('group-'));
      expect(groupFiles.filter((f) => opened.reads(f) > 0), 'the server\'s thread read no group: the workers did').toEqual([]);
    } finally {
      await srv.close();
    }
  });

  it('switches all workers at a reload: under load every answer is wholly one build, and after the reload only the new one (cached or not)', async () => {
    const link = join(root, 'live');
    await pointAt(link, storeA);
    // (not /api/info: it names the generation, which every reload changes)
    const differ = paths.filter((p) => p !== '/api/info' && expectedA.get(p)?.text !== expectedB.get(p)?.text);
    expect(differ.length, 'the two builds answer most requests differently').toBeGreaterThan(paths.length / 2);
    const srv = await createServer({ storeDir: link, port: 0, workers: 2, log: () => {} });
    let stop = false;
    const seen: { path: string; answer: Answer }[] = [];
    const loops = Array.from({ length: 6 }, async (_, j) => {
      for (let i = j; !stop; i++) {
        const path = differ[i % differ.length] ?? '';
        seen.push({ path, answer: await get(srv, path) });
      }
    });
    try {
      for (const [round, target, expected] of [[1, storeB, expectedB], [2, storeA, expectedA], [3, storeB, expectedB], [4, storeA, expectedA]] as const) {
        await new Promise((r) => setTimeout(r, 150));
        await pointAt(link, target);
        const loaded = await srv.reload();
        expect(loaded.generation).toBe(round + 1);
        // asked after the reload: the new build only, first computed then from the cache
        for (const p of differ.slice(0, 8)) expect(await get(srv, p), `${p} after reload ${round}`).toEqual(expected.get(p));
        for (const p of differ.slice(0, 8)) expect(await get(srv, p), `${p} cached after reload ${round}`).toEqual(expected.get(p));
      }
    } finally {
      stop = true;
      await Promise.all(loops);
      await srv.close();
    }
    expect(seen.length).toBeGreaterThan(50);
    for (const { path, answer } of seen) expect([expectedA.get(path), expectedB.get(path)], path).toContainEqual(answer);
  });

  it('a reload that a worker cannot open fails as a whole: the old build answers everywhere', async () => {
    const link = join(root, 'half');
    await pointAt(link, storeA);
    let swapAfterLoad = false;
    const srv = await createServer({
      storeDir: link,
      port: 0,
      cacheEntries: 0,
      workers: 2,
      log: () => {},
      // a rebuild landing between the server's open and the workers': they see another build
      loadStore: async (dir, previous) => {
        const served = await loadServedStore(dir, previous);
        if (swapAfterLoad) await pointAt(link, storeB);
        return served;
      },
    });
    try {
      swapAfterLoad = true;
      await expect(srv.reload()).rejects.toMatchObject({ code: 'kindred.store.corrupt' });
      expect(srv.holder.current.generation).toBe(1);
      const got = await Promise.all(paths.map((p) => get(srv, p)));
      got.forEach((a, i) => expect(a, `${paths[i]} from the old build`).toEqual(expectedA.get(paths[i] ?? '')));
      swapAfterLoad = false;
      expect((await srv.reload()).generation, 'the next reload, of an unchanging folder, goes through').toBe(2);
      for (const p of paths.slice(0, 10)) expect(await get(srv, p), p).toEqual(expectedB.get(p));
    } finally {
      await srv.close();
    }
  });

  it('a worker that dies fails its running request with a clear 503, the server goes on answering, and the worker is started again', async () => {
    const lines: string[] = [];
    const srv = await createServer({ storeDir: storeA, port: 0, cacheEntries: 0, workers: 1, log: (l) => lines.push(l) });
    try {
      const pool = srv.pool;
      if (!pool) throw new Error('no pool');
      const first = pool.workers[0]?.threadId;
      // a replay of past seasons: seconds of work, running in the worker when it is stopped
      const slow = get(srv, '/api/backtest?group=IF');
      await new Promise((r) => setTimeout(r, 500));
      await pool.workers[0]?.terminate();
      const lost = await slow;
      expect(lost.status).toBe(503);
      expect(JSON.parse(lost.text)).toMatchObject({ error: { code: 'kindred.http.workerFailed' } });
      // meanwhile answered on the server's thread, then by the restarted worker: the same bytes
      for (const p of paths.slice(0, 5)) expect(await get(srv, p), p).toEqual(expectedA.get(p));
      const deadline = Date.now() + 30_000;
      while (!(pool.workers[0]?.threadId !== first && pool.workers[0]?.threadId !== -1 && pool.waiting === 0 && lines.length > 0) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
      expect(pool.workers[0]?.threadId).not.toBe(first);
      for (const p of paths.slice(5, 15)) expect(await get(srv, p), p).toEqual(expectedA.get(p));
      expect(lines.join('\n')).toMatch(/answer thread stopped/);
    } finally {
      await srv.close();
    }
  });
});
