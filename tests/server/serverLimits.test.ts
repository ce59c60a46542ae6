/**
 * Defects found by probing the server as a careless client or an attacker would: each test reproduces
 * one (idle sockets never closed, no connection cap, unbounded answer cache, paths in 503 bodies, an
 * aborted upload logged as a failure with a stack, a busy port as a raw stack trace).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cp, rm } from 'node:fs/promises';
import { connect, type Socket } from 'node:net';
import { join } from 'node:path';
import { createServer, type RunningServer } from '../../src/server/createServer.ts';
import { main } from '../../src/cli/main.ts';
import { KindredError } from '../../src/errors/KindredError.ts';
import { captureIo } from '../helpers/captureIo.ts';
import { buildDemoStore, errorOf, rawExchange, send, tempDir } from './serverFixture.ts';

let dir = '';
let storeDir = '';
let cleanup: () => Promise<void> = async () => {};

beforeAll(async () => {
  const t = await tempDir('kindred-limits-');
  dir = t.dir;
  cleanup = t.remove;
  storeDir = join(dir, 'store');
  await buildDemoStore(storeDir);
});
afterAll(() => cleanup());

async function serve(limits: Parameters<typeof createServer>[0]['limits'] = {}, log: string[] = [], store = storeDir): Promise<RunningServer> {
  return createServer({ storeDir: store, port: 0, webRoot: join(dir, 'no-page'), limits, log: (l) => log.push(l) });
}

const opened = (url: string): Promise<Socket> =>
  new Promise((resolve, reject) => {
    const u = new URL(url);
    const s = connect(Number(u.port), u.hostname, () => resolve(s));
    s.on('error', reject);
  });

describe('connections', () => {
  it('closes a connection that never sends a request (headersTimeout alone leaves it open)', async () => {
    const srv = await serve({ idleTimeoutMs: 300, headersTimeoutMs: 10_000 });
    try {
      const r = await rawExchange(srv.url, '', 4000);
      expect(r.closed).toBe(true);
      expect(r.ms).toBeLessThan(3000);
    } finally {
      await srv.close();
    }
  });

  it('refuses connections past maxConnections at once and answers again when they are gone', async () => {
    const srv = await serve({ maxConnections: 2 });
    const host = new URL(srv.url).host;
    const held = [await opened(srv.url), await opened(srv.url)];
    try {
      const third = await rawExchange(srv.url, `GET /api/info HTTP/1.1\r\nHost: ${host}\r\n\r\n`, 3000);
      expect(third.closed).toBe(true);
      expect(third.text).toBe('');
      for (const s of held) s.destroy();
      await new Promise((r) => setTimeout(r, 200));
      expect((await send(srv.url, '/api/info', { headers: { Host: host } })).status).toBe(200);
    } finally {
      for (const s of held) s.destroy();
      await srv.close();
    }
  });
});

describe('answers', () => {
  it('refuses k past the largest allowed (2^53 was accepted) and does not cache a very large answer', async () => {
    const srv = await serve();
    const host = new URL(srv.url).host;
    try {
      const huge = await send(srv.url, '/api/comps?player=p000002&k=9007199254740993', { headers: { Host: host } });
      expect([huge.status, errorOf(huge).message]).toEqual([400, expect.stringMatching(/^parameter k: expected a whole number/)]);
      const cache = srv.holder.current.answers;
      const small = await send(srv.url, '/api/comps?player=p000002&k=3', { headers: { Host: host } });
      expect(small.status).toBe(200);
      expect(cache.size).toBe(1);
      const big = await send(srv.url, '/api/comps?player=p000002&k=1000&all-seasons=true&min-coverage=0', { headers: { Host: host } });
      expect(big.status).toBe(200);
      expect(Buffer.byteLength(big.text)).toBeGreaterThan(cache.limits.maxEntryBytes);
      expect(cache.size).toBe(1);
      expect(cache.bytes).toBeLessThanOrEqual(cache.limits.maxBytes);
    } finally {
      await srv.close();
    }
  });

  it('answers 503 in the API\'s words when the store is gone, with no filesystem path; the log has the path', async () => {
    const copy = join(dir, 'copy');
    await cp(storeDir, copy, { recursive: true });
    const log: string[] = [];
    const srv = await serve({}, log, copy);
    const host = new URL(srv.url).host;
    try {
      await rm(copy, { recursive: true, force: true });
      const r = await send(srv.url, '/api/reload', { method: 'POST', headers: { Host: host } });
      expect(r.status).toBe(503);
      expect(errorOf(r).code).toMatch(/^kindred\.store\./);
      expect(r.text).not.toContain(dir);
      expect(r.text).not.toMatch(/\/tmp|\/work|\\\\/);
      expect(log.join('\n')).toContain(copy);
    } finally {
      await srv.close();
    }
  });

  it('logs an upload the client abandoned as one line, not as an unexpected failure with a stack', async () => {
    const log: string[] = [];
    const srv = await serve({}, log);
    const host = new URL(srv.url).host;
    try {
      const s = await opened(srv.url);
      s.write(`POST /api/reload HTTP/1.1\r\nHost: ${host}\r\nContent-Length: 1000\r\n\r\n0123456789`);
      await new Promise((r) => setTimeout(r, 200));
      s.destroy();
      await new Promise((r) => setTimeout(r, 500));
      expect(log).toHaveLength(1);
      expect(log[0]).toMatch(/^kindred serve: POST \/api\/reload: the client closed the connection after 10 bytes/);
      expect(log[0]).not.toMatch(/\n|unexpected|\bat /);
    } finally {
      await srv.close();
    }
  });
});

describe('listening', () => {
  it('says in one line that a port is in use (no EADDRINUSE stack), from createServer and from the CLI', async () => {
    const first = await serve();
    const port = Number(new URL(first.url).port);
    try {
      const second = createServer({ storeDir, port, webRoot: join(dir, 'no-page') });
      await expect(second).rejects.toBeInstanceOf(KindredError);
      await expect(second).rejects.toMatchObject({ code: 'kindred.serve.portInUse', message: `127.0.0.1:${port} is already in use (another server is listening there): choose another port` });
      const c = captureIo();
      expect(await main(['serve', '--store', storeDir, '--port', String(port)], c.io)).toBe(1);
      expect(c.stderr()).toBe(`kindred: 127.0.0.1:${port} is already in use (another server is listening there): choose another port [kindred.serve.portInUse]\n`);
    } finally {
      await first.close();
    }
  });
});
