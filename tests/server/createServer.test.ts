import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { createServer, type RunningServer } from '../../src/server/createServer.ts';
import { main } from '../../src/cli/main.ts';
import { captureIo } from '../helpers/captureIo.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { StoreError } from '../../src/errors/KindredError.ts';
import { buildDemoStore, errorOf, json, rawExchange, send, tempDir, writeTinyPage } from './serverFixture.ts';

let storeDir = '';
let webRoot = '';
let cleanup: () => Promise<void> = async () => {};
let srv: RunningServer;
let host = '';
let logged: string[] = [];

/** What the CLI prints for the same query (parsed JSON) and its exit code. */
async function cli(args: string[]): Promise<{ code: number; out: unknown }> {
  const c = captureIo();
  const code = await main([...args, '--store', storeDir, '--format', 'json'], c.io);
  return { code, out: code === 0 ? (JSON.parse(c.stdout()) as unknown) : c.stderr() };
}

const get = (path: string, headers: Record<string, string> = {}) => send(srv.url, path, { headers: { Host: host, ...headers } });

beforeAll(async () => {
  const t = await tempDir('kindred-serve-');
  cleanup = t.remove;
  storeDir = join(t.dir, 'store');
  webRoot = join(t.dir, 'web');
  await buildDemoStore(storeDir);
  await writeTinyPage(webRoot);
  srv = await createServer({ storeDir, port: 0, webRoot, log: (l) => logged.push(l) });
  host = new URL(srv.url).host;
});

afterAll(async () => {
  await srv.close();
  await cleanup();
});

describe('GET /api/comps answers what `kindred comps --format json` prints', () => {
  const cases: [string, string[], string][] = [
    ['defaults', [], ''],
    ['season and k', ['--season', 'SEASON', '--k', '5'], 'season=SEASON&k=5'],
    ['pool filters', ['--pool-level', 'High,Elite,Top', '--age', '21-', '--bats', 'L,R', '--throws', 'R'], 'pool-level=High,Elite,Top&age=21-&bats=L,R&throws=R'],
    ['seasons and positions of the pool', ['--pool-season', '2010-2020', '--pool-position', 'SS,2B,3B,1B,C'], 'pool-season=2010-2020&pool-position=SS,2B,3B,1B,C'],
    ['weights and preset', ['--preset', 'bat', '--weights', 'obp=2,k_pct=0.5', '--weighting', 'plain'], 'preset=bat&weights=obp%3D2%2Ck_pct%3D0.5&weighting=plain'],
    ['flags and coverage', ['--exact', '--all-seasons', '--min-coverage', '0.8', '--k', '12'], 'exact=true&all-seasons=1&min-coverage=0.8&k=12'],
  ];
  it.each(cases)('with %s', async (_name, args, query) => {
    const store = await openProfileStore(storeDir);
    const g = store.groups.get('IF');
    const player = store.players[g?.player[0] ?? 0]?.playerId ?? '';
    const season = String(g?.season[0] ?? 0);
    const expected = await cli(['comps', player, ...args.map((a) => a.replace('SEASON', season))]);
    expect(expected.code).toBe(0);
    const r = await get(`/api/comps?player=${player}${query ? `&${query.replace('SEASON', season)}` : ''}`);
    expect(r.status).toBe(200);
    expect(r.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(json(r)).toEqual(expected.out);
  });

  it('with a hand-built want profile in grades and natural units', async () => {
    const expected = await cli(['comps', '--want', 'obp=60g,iso=.200,k_pct=45g', '--position', 'SS', '--k', '4']);
    expect(expected.code).toBe(0);
    const r = await get(`/api/comps?want=${encodeURIComponent('obp=60g,iso=.200,k_pct=45g')}&position=SS&k=4`);
    expect(r.status).toBe(200);
    expect(json(r)).toEqual(expected.out);
  });

  it('with a player named by part of his name', async () => {
    const store = await openProfileStore(storeDir);
    const counts = new Map<string, number>();
    for (const p of store.players) counts.set(p.name, (counts.get(p.name) ?? 0) + 1);
    const unique = store.players.find((p, i) => counts.get(p.name) === 1 && store.groups.get('C')?.player.includes(i));
    const name = unique?.name ?? '';
    const expected = await cli(['comps', name]);
    expect(expected.code).toBe(0);
    const r = await get(`/api/comps?player=${encodeURIComponent(name)}`);
    expect(json(r)).toEqual(expected.out);
  });
});

describe('GET /api/comps refuses every bad parameter with 400 and names it', () => {
  const bad: [string, string, RegExp][] = [
    ['k=0', 'kindred.usage.badOption', /parameter k: expected a whole number/],
    ['k=ten', 'kindred.usage.badOption', /parameter k: .*"ten"/],
    ['season=20x', 'kindred.usage.badOption', /parameter season: expected a four-digit season/],
    ['pool-season=2020-2010', 'kindred.usage.badOption', /runs backwards/],
    ['age=old', 'kindred.usage.badOption', /parameter age: expected ages/],
    ['bats=Q', 'kindred.usage.badOption', /expected bats L, R or S, got "Q"/],
    ['throws=S', 'kindred.usage.badOption', /expected throws L or R/],
    ['position=XX', 'kindred.usage.badOption', /expected a position/],
    ['pool-position=SS,ZZ', 'kindred.usage.badOption', /expected a position .*"ZZ"/],
    ['min-coverage=2', 'kindred.usage.badOption', /expected a number from 0 to 1/],
    ['preset=heavy', 'kindred.usage.badOption', /unknown preset "heavy"/],
    ['weighting=odd', 'kindred.usage.badOption', /expected redundancy or plain/],
    ['weights=obp%3Dlots', 'kindred.usage.badOption', /expected name=multiplier/],
    ['weights=obpp%3D2', 'kindred.usage.badOption', /no dimension "obpp" \(did you mean obp\?\)/],
    ['pool-level=ZZ', 'kindred.usage.badOption', /unknown level "ZZ"/],
    ['exact=maybe', 'kindred.usage.badOption', /parameter exact: expected true or false/],
    ['kk=3', 'kindred.usage.badOption', /unknown parameter "kk" \(did you mean k\?\)/],
    ['k=3&k=4', 'kindred.usage.badOption', /given more than once/],
    ['level=', 'kindred.usage.badOption', /^parameter level: needs a value$/],
    ['store=%2Fetc', 'kindred.usage.badOption', /unknown parameter "store"/],
    ['batch=targets.csv', 'kindred.usage.badOption', /unknown parameter "batch"/],
    ['format=csv', 'kindred.usage.badOption', /unknown parameter "format"/],
  ];
  it.each(bad)('%s', async (query, code, message) => {
    const r = await get(`/api/comps?player=p000002&${query}`);
    expect(r.status).toBe(400);
    const e = errorOf(r);
    expect(e.code).toBe(code);
    expect(e.message).toMatch(message);
  });

  it('no player and no want is a missing argument', async () => {
    const r = await get('/api/comps?k=3');
    expect(r.status).toBe(400);
    expect(errorOf(r).code).toBe('kindred.usage.missingArgument');
  });

  it('a want without a position, a badly written want and want with a player are refused', async () => {
    const a = await get('/api/comps?want=obp%3D60g');
    expect([a.status, errorOf(a).message]).toEqual([400, expect.stringMatching(/^want needs position \(/)]);
    const b = await get('/api/comps?want=obp%3Dhigh&position=C');
    expect([b.status, errorOf(b).message]).toEqual([400, expect.stringMatching(/is not name=value/)]);
    const c = await get('/api/comps?want=obp%3D90g&position=C');
    expect([c.status, errorOf(c).message]).toEqual([400, expect.stringMatching(/off the 20 to 80 scale/)]);
    const d = await get('/api/comps?want=obp%3D60g&position=C&player=p000002');
    expect([d.status, errorOf(d).message]).toEqual([400, expect.stringMatching(/^give either a player or want, not both$/)]);
  });

  it('a value longer than the cap is refused before parsing', async () => {
    const r = await get(`/api/comps?player=${'x'.repeat(2500)}`);
    expect(r.status).toBe(400);
    expect(errorOf(r).message).toMatch(/2500 characters long/);
  });
});

describe('GET /api/comps answers 404 for an unknown player or player-season', () => {
  it('unknown player', async () => {
    const r = await get('/api/comps?player=nobody-at-all');
    expect(r.status).toBe(404);
    expect(errorOf(r)).toEqual({ code: 'kindred.query.unknownPlayer', message: 'no player matches "nobody-at-all"' });
  });
  it('a season he did not play', async () => {
    const r = await get('/api/comps?player=p000002&season=1901');
    expect(r.status).toBe(404);
    expect(errorOf(r).code).toBe('kindred.query.noSeason');
  });
});

describe('GET /api/players', () => {
  it('suggests players whose name contains the text, with their profiled seasons latest first', async () => {
    const store = await openProfileStore(storeDir);
    const someone = store.players[5];
    const part = (someone?.name.split(' ')[1] ?? '').slice(0, 4);
    const r = await get(`/api/players?q=${encodeURIComponent(part)}&limit=20`);
    expect(r.status).toBe(200);
    const v = json(r) as { players: { name: string; player_id: string; seasons: { season: number }[] }[] };
    expect(v.players.length).toBeGreaterThan(0);
    expect(v.players.length).toBeLessThanOrEqual(20);
    for (const p of v.players) expect(p.name.toLowerCase()).toContain(part.toLowerCase());
    for (const p of v.players) {
      const seasons = p.seasons.map((s) => s.season);
      expect(seasons).toEqual([...seasons].sort((a, b) => b - a));
    }
  });
  it('refuses a missing q, a limit over 50 and unknown parameters', async () => {
    const cases: [string, RegExp][] = [
      ['/api/players', /^parameter q: is required/],
      ['/api/players?q=ab&limit=51', /from 1 to 50, got "51"/],
      ['/api/players?q=ab&limit=0', /parameter limit/],
      ['/api/players?q=ab&name=x', /unknown parameter "name"/],
    ];
    for (const [path, message] of cases) {
      const r = await get(path);
      expect(r.status, path).toBe(400);
      expect(errorOf(r).message).toMatch(message);
    }
  });
});

describe('GET /api/dims answers what `kindred dims --format json` prints', () => {
  it.each([[[], ''], [['--position', 'C'], '?position=C'], [['--position', 'sp'], '?position=sp']] as [string[], string][])('%j', async (args, query) => {
    const c = captureIo();
    expect(await main(['dims', ...args, '--format', 'json'], c.io)).toBe(0);
    const r = await get(`/api/dims${query}`);
    expect(r.status).toBe(200);
    expect(json(r)).toEqual(JSON.parse(c.stdout()));
  });
  it('refuses a bad position and the format option', async () => {
    expect((await get('/api/dims?position=QB')).status).toBe(400);
    expect(errorOf(await get('/api/dims?format=table')).message).toMatch(/unknown parameter "format"/);
  });
});

describe('GET /api/map', () => {
  it('gives one point per player-season of the group, with the share of variance of each axis', async () => {
    const store = await openProfileStore(storeDir);
    const r = await get('/api/map?group=C');
    expect(r.status).toBe(200);
    const m = json(r) as { n: number; x: number[]; y: number[]; player_id: string[]; season: number[]; level: string[]; explained: number[] };
    const g = store.groups.get('C');
    expect(m.n).toBe(g?.n);
    for (const col of [m.x, m.y, m.player_id, m.season, m.level]) expect(col.length).toBe(m.n);
    const [a = 0, b = 0] = m.explained;
    expect(a).toBeGreaterThanOrEqual(b);
    expect(a + b).toBeLessThanOrEqual(1);
    expect(b).toBeGreaterThan(0);
    expect(m.player_id[0]).toBe(store.players[g?.player[0] ?? 0]?.playerId);
    expect(json(await get('/api/map?group=C'))).toEqual(m);
  });
  it('refuses a missing or unknown group', async () => {
    expect(errorOf(await get('/api/map')).message).toMatch(/^parameter group: is required/);
    expect(errorOf(await get('/api/map?group=ZZ')).message).toMatch(/expected a position group/);
    expect(errorOf(await get('/api/map?group=hitters')).message).toMatch(/expected one position group/);
  });
});

describe('GET /api/info', () => {
  it('summarises the loaded store', async () => {
    const store = await openProfileStore(storeDir);
    const v = json(await get('/api/info')) as { levels: string[]; groups: Record<string, { n: number }>; generation: number; presets: string[] };
    expect(v.levels).toEqual(store.levels);
    expect(v.groups.IF?.n).toBe(store.groups.get('IF')?.n);
    expect(v.presets).toContain('balanced');
  });
});

describe('methods and unknown paths', () => {
  it('answers 405 with Allow for a wrong method and 404 for an unknown endpoint', async () => {
    const post = await send(srv.url, '/api/comps?player=p000002', { method: 'POST', headers: { Host: host } });
    expect(post.status).toBe(405);
    expect(post.headers.allow).toBe('GET');
    const getReload = await get('/api/reload');
    expect(getReload.status).toBe(405);
    expect(getReload.headers.allow).toBe('POST');
    const options = await send(srv.url, '/api/comps', { method: 'OPTIONS', headers: { Host: host, Origin: 'http://evil.example', 'Access-Control-Request-Method': 'GET' } });
    expect(options.status).toBe(403);
    expect(options.headers['access-control-allow-origin']).toBeUndefined();
    const missing = await get('/api/nothing');
    expect([missing.status, errorOf(missing).code]).toEqual([404, 'kindred.http.notFound']);
  });
});

describe('hardening', () => {
  it('answers 421 to a Host that is not this server (DNS rebinding) and 400 without a Host', async () => {
    const port = new URL(srv.url).port;
    for (const h of ['evil.example', `evil.example:${port}`, `localhost:${Number(port) + 1}`, `127.0.0.1.evil.example:${port}`]) {
      const r = await send(srv.url, '/api/info', { headers: { Host: h } });
      expect(r.status, h).toBe(421);
      expect(errorOf(r).code).toBe('kindred.http.misdirected');
    }
    for (const h of [`localhost:${port}`, `127.0.0.1:${port}`, `LOCALHOST:${port}`]) expect((await send(srv.url, '/api/info', { headers: { Host: h } })).status, h).toBe(200);
    const raw = await rawExchange(srv.url, 'GET /api/info HTTP/1.0\r\n\r\n', 2000);
    expect(raw.text).toMatch(/^HTTP\/1\.1 400/);
  });

  it('refuses a foreign Origin and cross-site fetches with 403 and never sends CORS headers', async () => {
    for (const origin of ['http://evil.example', 'null', `https://${host}`, `http://${host}.evil.example`]) {
      const r = await get('/api/info', { Origin: origin });
      expect(r.status, origin).toBe(403);
      expect(errorOf(r).code).toBe('kindred.http.foreignOrigin');
      expect(r.headers['access-control-allow-origin']).toBeUndefined();
    }
    expect((await get('/api/info', { 'Sec-Fetch-Site': 'cross-site' })).status).toBe(403);
    const own = await get('/api/info', { Origin: `http://${host}`, 'Sec-Fetch-Site': 'same-origin' });
    expect(own.status).toBe(200);
    expect(Object.keys(own.headers).filter((k) => k.startsWith('access-control-'))).toEqual([]);
  });

  it('answers 413 to a body over the cap, declared or streamed', async () => {
    const big = Buffer.alloc(200 * 1024, 97);
    const declared = await send(srv.url, '/api/reload', { method: 'POST', headers: { Host: host, 'Content-Length': String(big.length) }, body: big });
    expect(declared.status).toBe(413);
    expect(errorOf(declared).code).toBe('kindred.http.bodyTooLarge');
    const chunked = await send(srv.url, '/api/reload', { method: 'POST', headers: { Host: host, 'Transfer-Encoding': 'chunked' }, body: big });
    expect(chunked.status).toBe(413);
  });

  it('answers 431 to headers over maxHeaderSize', async () => {
    const r = await rawExchange(srv.url, `GET /api/info HTTP/1.1\r\nHost: ${host}\r\nX-Big: ${'a'.repeat(20_000)}\r\n\r\n`, 2000);
    expect(r.text).toMatch(/^HTTP\/1\.1 431/);
  });

  it('serves only the bundled files: traversal, encoded dots and other paths are 404', async () => {
    const secret = (await readFile(join(process.cwd(), 'package.json'), 'utf8')).slice(0, 40);
    const paths = [
      '/../package.json',
      '/%2e%2e/package.json',
      '/%2E%2E%2Fpackage.json',
      '/assets/../../package.json',
      '/assets/%2e%2e/%2e%2e/package.json',
      '/..%5c..%5cpackage.json',
      '//etc/passwd',
      '/index.html%00.js',
      '/assets/',
      '/.gitignore',
    ];
    for (const p of paths) {
      const raw = await rawExchange(srv.url, `GET ${p} HTTP/1.1\r\nHost: ${host}\r\nConnection: close\r\n\r\n`, 2000);
      expect(raw.text, p).toMatch(/^HTTP\/1\.1 (404|400)/);
      expect(raw.text).not.toContain(secret);
    }
  });

  it('serves the page with its type and caching, and HEAD without a body', async () => {
    const page = await get('/');
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(page.text).toContain('<title>tiny</title>');
    const asset = await get('/assets/app-1.js');
    expect(asset.headers['content-type']).toBe('text/javascript; charset=utf-8');
    expect(asset.headers['cache-control']).toContain('immutable');
    const head = await send(srv.url, '/', { method: 'HEAD', headers: { Host: host } });
    expect([head.status, head.text]).toEqual([200, '']);
  });

  it('sends the security headers on pages, answers and errors', async () => {
    for (const path of ['/', '/api/info', '/api/comps?k=0', '/nothing']) {
      const r = await get(path);
      expect(r.headers['content-security-policy'], path).toMatch(/^default-src 'self'/);
      expect(r.headers['x-content-type-options']).toBe('nosniff');
      expect(r.headers['x-frame-options']).toBe('DENY');
      expect(r.headers['referrer-policy']).toBe('no-referrer');
    }
    expect((await get('/api/info')).headers['cache-control']).toBe('no-store');
  });
});

describe('failures inside the server', () => {
  it('answers 500 with a plain message and no stack, and logs the stack', async () => {
    const t = await tempDir('kindred-serve-broken-');
    const store = await openProfileStore(storeDir);
    class BrokenLookup extends Map<string, number> {
      override get(): never {
        throw new TypeError('internal detail /very/secret/path');
      }
    }
    logged = [];
    const broken = await createServer({ storeDir, port: 0, webRoot: t.dir, loadStore: async () => ({ store: { ...store, playerById: new BrokenLookup() }, outcomes: new StoreError('kindred.store.missing', 'no outcomes') }), log: (l) => logged.push(l) });
    try {
      const r = await send(broken.url, '/api/comps?player=p000002', { headers: { Host: new URL(broken.url).host } });
      expect(r.status).toBe(500);
      expect(errorOf(r).code).toBe('kindred.http.internal');
      expect(r.text).not.toMatch(/secret|TypeError|\.ts:\d+/);
      expect(logged.join('\n')).toMatch(/internal detail \/very\/secret\/path/);
      const page = await send(broken.url, '/', { headers: { Host: new URL(broken.url).host } });
      expect([page.status, errorOf(page).code]).toEqual([503, 'kindred.http.pageNotBuilt']);
    } finally {
      await broken.close();
      await t.remove();
    }
  });
});

describe('timeouts', () => {
  it('drops a client that sends its headers too slowly (headersTimeout) with 408', async () => {
    const t = await tempDir('kindred-serve-slow-');
    const slow = await createServer({ storeDir, port: 0, webRoot: t.dir, limits: { headersTimeoutMs: 300, requestTimeoutMs: 600 } });
    try {
      const h = new URL(slow.url).host;
      const r = await rawExchange(slow.url, `GET /api/info HTTP/1.1\r\nHost: ${h}\r\nX-Slow: `, 4000);
      expect(r.closed).toBe(true);
      expect(r.text).toMatch(/^HTTP\/1\.1 408/);
      expect(r.ms).toBeLessThan(3000);
      const fine = await send(slow.url, '/api/info', { headers: { Host: h } });
      expect(fine.status).toBe(200);
    } finally {
      await slow.close();
      await t.remove();
    }
  });
});
