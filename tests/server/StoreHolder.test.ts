import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cp, readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { StoreHolder } from '../../src/server/StoreHolder.ts';
import { StoreError } from '../../src/errors/KindredError.ts';
import { createServer } from '../../src/server/createServer.ts';
import { DEFAULT_PROFILE_OPTIONS } from '../../src/profiles/buildProfiles.ts';
import { buildDemoStore, errorOf, json, send, tempDir } from './serverFixture.ts';

let root = '';
let remove: () => Promise<void> = async () => {};
/** The demo store with the default sample minimums, and one with much higher minimums (fewer profiles). */
let fullStore = '';
let strictStore = '';

beforeAll(async () => {
  const t = await tempDir('kindred-reload-');
  root = t.dir;
  remove = t.remove;
  fullStore = join(root, 'full');
  strictStore = join(root, 'strict');
  await buildDemoStore(fullStore);
  await buildDemoStore(strictStore, { profile: { ...DEFAULT_PROFILE_OPTIONS, minimums: { minPa: 150, minBf: 150 } } });
});

afterAll(async () => remove());

const groupSize = (info: unknown): number | undefined =>
  typeof info === 'object' && info !== null && 'groups' in info && typeof info.groups === 'object' && info.groups !== null && 'IF' in info.groups
    ? (info.groups.IF as { n: number }).n
    : undefined;

describe('StoreHolder', () => {
  it('reload() swaps in a rebuilt store only after it loaded in full', async () => {
    const dir = join(root, 'live-a');
    await cp(fullStore, dir, { recursive: true });
    const holder = await StoreHolder.open(dir);
    const before = holder.current;
    const nBefore = before.store.groups.get('IF')?.n ?? 0;
    await rm(dir, { recursive: true });
    await cp(strictStore, dir, { recursive: true });
    expect(holder.current).toBe(before);
    const after = await holder.reload();
    expect(holder.current).toBe(after);
    expect(after.generation).toBe(before.generation + 1);
    const nAfter = after.store.groups.get('IF')?.n ?? 0;
    expect(nAfter).toBeGreaterThan(0);
    expect(nAfter).toBeLessThan(nBefore);
  });

  it('a failed reload (corrupt file) rejects and keeps the old store', async () => {
    const dir = join(root, 'live-b');
    await cp(fullStore, dir, { recursive: true });
    const holder = await StoreHolder.open(dir);
    const before = holder.current;
    const file = join(dir, 'players.bin');
    const bytes = await readFile(file);
    bytes[bytes.length - 1] = (bytes[bytes.length - 1] ?? 0) ^ 1;
    await writeFile(file, bytes);
    await expect(holder.reload()).rejects.toMatchObject({ code: 'kindred.store.corrupt' });
    expect(holder.current).toBe(before);
  });

  it('reads the outcomes on first use, from the build it opened: a store swapped in meanwhile is not read, a file damaged in place is refused', async () => {
    const dir = join(root, 'lazy-outcomes');
    await cp(fullStore, dir, { recursive: true });
    const swapped = await StoreHolder.open(dir);
    // the folder replaced after the load: the outcomes still come from the files the load opened
    await rm(dir, { recursive: true });
    await cp(strictStore, dir, { recursive: true });
    const kept = swapped.current.outcomes;
    expect(kept instanceof StoreError ? kept.code : kept.topLevel).toBe('Top');
    expect(swapped.current.outcomes, 'read once, then kept').toBe(kept);
    // damaged in place after the load (same file, checksum no longer matching): refused when first read
    const damaged = await StoreHolder.open(dir);
    await writeFile(join(dir, 'outcomes.json'), '{"format":"kindred-outcomes"}');
    const refused = damaged.current.outcomes;
    expect(refused instanceof StoreError ? refused.code : 'read').toBe('kindred.store.corrupt');
    expect(damaged.current.store.groups.get('IF')?.n, 'the profiles still answer').toBeGreaterThan(0);
  });
  it('reloads asked at once run one after the other and each sees a complete store', async () => {
    const dir = join(root, 'live-c');
    await cp(fullStore, dir, { recursive: true });
    const holder = await StoreHolder.open(dir);
    const [a, b] = await Promise.all([holder.reload(), holder.reload()]);
    expect([a.generation, b.generation]).toEqual([2, 3]);
    expect(holder.current).toBe(b);
  });
});

describe('POST /api/reload', () => {
  // Once in three full runs of the suite on 2 cores, a request here was refused (ECONNREFUSED) by the
  // server the test had just started; alone it passed every time and the cause is not yet found. One
  // retry keeps the suite trustworthy while the cause is looked for: a real regression fails twice.
  it('picks up a rebuilt store; a broken store is a 503 and the old one goes on answering', { retry: 1 }, async () => {
    const dir = join(root, 'live-d');
    const web = await tempDir('kindred-reload-web-');
    await cp(fullStore, dir, { recursive: true });
    const srv = await createServer({ storeDir: dir, port: 0, webRoot: web.dir });
    const host = new URL(srv.url).host;
    try {
      const info1 = json(await send(srv.url, '/api/info', { headers: { Host: host } }));
      const compsPath = '/api/comps?want=obp%3D60g&position=SS&window=1'; // single seasons: the group sizes /api/info gives
      const comps1 = json(await send(srv.url, compsPath, { headers: { Host: host } })) as { pool: { group_size: number } };
      expect(comps1.pool.group_size).toBe(groupSize(info1));
      await rm(dir, { recursive: true });
      await cp(strictStore, dir, { recursive: true });
      const reloaded = await send(srv.url, '/api/reload', { method: 'POST', headers: { Host: host, Origin: `http://${host}` } });
      expect(reloaded.status).toBe(200);
      expect(groupSize(json(reloaded))).toBeLessThan(groupSize(info1) ?? 0);
      const info2 = json(await send(srv.url, '/api/info', { headers: { Host: host } }));
      expect(groupSize(info2)).toBe(groupSize(json(reloaded)));
      const comps2 = json(await send(srv.url, compsPath, { headers: { Host: host } })) as { pool: { group_size: number } };
      expect(comps2.pool.group_size).toBe(groupSize(info2));

      await rm(join(dir, 'players.bin'));
      const failed = await send(srv.url, '/api/reload', { method: 'POST', headers: { Host: host } });
      expect(failed.status).toBe(503);
      expect(errorOf(failed).code).toMatch(/^kindred\.store\./);
      const info3 = json(await send(srv.url, '/api/info', { headers: { Host: host } }));
      expect(groupSize(info3)).toBe(groupSize(info2));

      const foreign = await send(srv.url, '/api/reload', { method: 'POST', headers: { Host: host, Origin: 'http://evil.example' } });
      expect(foreign.status).toBe(403);
      const withParam = await send(srv.url, '/api/reload?now=1', { method: 'POST', headers: { Host: host } });
      expect(withParam.status).toBe(400);
    } finally {
      await srv.close();
      await web.remove();
    }
  });
});
