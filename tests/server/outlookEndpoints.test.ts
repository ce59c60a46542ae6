import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cp, readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { createServer, type RunningServer } from '../../src/server/createServer.ts';
import { main } from '../../src/cli/main.ts';
import { captureIo } from '../helpers/captureIo.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import { buildDemoStore, errorOf, json, send, tempDir } from './serverFixture.ts';

let root = '';
let storeDir = '';
let store: ProfileStore;
let remove: () => Promise<void> = async () => {};
let srv: RunningServer;
let host = '';

async function cli(args: string[]): Promise<unknown> {
  const c = captureIo();
  const code = await main([...args, '--store', storeDir, '--format', 'json'], c.io);
  if (code !== 0) throw new Error(`kindred ${args.join(' ')} exited ${code}: ${c.stderr()}`);
  return JSON.parse(c.stdout()) as unknown;
}
const get = (path: string) => send(srv.url, path, { headers: { Host: host } });

/** Player-seasons of a group at a level, latest first: [player id, season]. */
function rowsAt(group: 'IF' | 'SP' | 'C', level: string, minAge = 0, maxAge = 99, paid = false): [string, number][] {
  const g = store.groups.get(group);
  const li = store.levels.indexOf(level);
  const out: [string, number][] = [];
  for (let i = 0; g && i < g.n; i++) {
    const age = g.age[i] as number;
    const salary = store.salaries.get(g.player[i] as number)?.get(g.season[i] as number);
    if (paid && salary === undefined) continue;
    if (g.level[i] === li && age >= minAge && age <= maxAge) out.push([store.players[g.player[i] as number]?.playerId ?? '', g.season[i] as number]);
  }
  return out.sort((a, b) => b[1] - a[1]);
}

beforeAll(async () => {
  const t = await tempDir('kindred-outlook-api-');
  root = t.dir;
  remove = t.remove;
  storeDir = join(root, 'store');
  await buildDemoStore(storeDir);
  store = await openProfileStore(storeDir);
  srv = await createServer({ storeDir, port: 0, webRoot: join(root, 'no-page') });
  host = new URL(srv.url).host;
});
afterAll(async () => {
  await srv.close();
  await remove();
});

describe('GET /api/prospect answers what `kindred prospect --format json` prints', () => {
  it.each([
    ['defaults', [], ''],
    ['horizon, path, k and censored comps', ['--horizon', '4', '--path', '2', '--k', '8', '--include-censored'], 'horizon=4&path=2&k=8&include-censored=true'],
    ['pool filters', ['--bats', 'L,R', '--min-coverage', '0.7'], 'bats=L,R&min-coverage=0.7'],
  ] as [string, string[], string][])('with %s', async (_name, args, query) => {
    const [id, season] = rowsAt('IF', 'High', 19, 23)[20] ?? ['', 0];
    const expected = await cli(['prospect', id, '--season', String(season), '--level', 'High', ...args]);
    const r = await get(`/api/prospect?player=${id}&season=${season}&level=High${query ? `&${query}` : ''}`);
    expect(r.status).toBe(200);
    expect(json(r)).toEqual(expected);
  });
  it('refuses bad parameters with 400 and the want of other commands', async () => {
    for (const [q, message] of [
      ['horizon=0', /parameter horizon: expected a whole number/],
      ['path=two', /parameter path/],
      ['include-censored=perhaps', /expected true or false/],
      ['want=obp%3D60g', /unknown parameter "want"/],
    ] as [string, RegExp][]) {
      const r = await get(`/api/prospect?player=p000002&${q}`);
      expect(r.status, q).toBe(400);
      expect(errorOf(r).message).toMatch(message);
    }
    expect((await get('/api/prospect?player=nobody-here')).status).toBe(404);
  });
  it('answers 503 when the store has no outcomes, and still answers comps', async () => {
    const dir = join(root, 'no-outcomes');
    await cp(storeDir, dir, { recursive: true });
    const manifest = JSON.parse(await readFile(join(dir, 'manifest.json'), 'utf8')) as { files: Record<string, unknown> };
    delete manifest.files['outcomes.json'];
    await writeFile(join(dir, 'manifest.json'), JSON.stringify(manifest));
    await rm(join(dir, 'outcomes.json'));
    const old = await createServer({ storeDir: dir, port: 0, webRoot: join(root, 'no-page') });
    try {
      const h = new URL(old.url).host;
      const r = await send(old.url, '/api/prospect?player=p000002', { headers: { Host: h } });
      expect(r.status).toBe(503);
      expect(errorOf(r).code).toBe('kindred.store.missing');
      expect((await send(old.url, '/api/comps?player=p000002', { headers: { Host: h } })).status).toBe(200);
    } finally {
      await old.close();
    }
  });
});

describe('GET /api/cheaper answers what `kindred cheaper --format json` prints', () => {
  it.each([
    ['defaults', [], ''],
    ['a salary limit in dollars', ['--max-salary', '2,000,000', '--k', '6'], 'max-salary=2%2C000%2C000&k=6'],
    ['a share of his salary', ['--max-share', '0.3'], 'max-share=0.3'],
  ] as [string, string[], string][])('with %s', async (_name, args, query) => {
    const [id, season] = rowsAt('IF', 'Top', 0, 99, true)[5] ?? ['', 0];
    const expected = await cli(['cheaper', id, '--season', String(season), '--level', 'Top', ...args]);
    const r = await get(`/api/cheaper?player=${id}&season=${season}&level=Top${query ? `&${query}` : ''}`);
    expect(r.status).toBe(200);
    expect(json(r)).toEqual(expected);
  });
  it('with a want profile and a salary limit', async () => {
    const expected = await cli(['cheaper', '--want', 'obp=60g,iso=55g', '--position', '2B', '--max-salary', '1500000']);
    expect(json(await get('/api/cheaper?want=obp%3D60g%2Ciso%3D55g&position=2B&max-salary=1500000'))).toEqual(expected);
  });
  it('refuses a bad amount, both limits at once and an unknown parameter', async () => {
    for (const [q, message] of [
      ['max-salary=lots', /expected an amount in US dollars/],
      ['max-share=2', /expected a number from 0 to 1/],
      ['max-salary=100&max-share=0.2', /^give either max-salary or max-share, not both$/],
      ['salary=100', /unknown parameter "salary"/],
    ] as [string, RegExp][]) {
      const r = await get(`/api/cheaper?player=p000002&${q}`);
      expect(r.status, q).toBe(400);
      expect(errorOf(r).message).toMatch(message);
    }
  });
});

describe('GET /api/match answers what `kindred match --format json` prints', () => {
  it('for two players, with and without the candidate season', async () => {
    const [[a, sa] = ['', 0], [b, sb] = ['', 0]] = rowsAt('SP', 'Top');
    expect(json(await get(`/api/match?player=${a}&season=${sa}&candidate=${b}`))).toEqual(await cli(['match', a, b, '--season', String(sa)]));
    expect(json(await get(`/api/match?player=${a}&candidate=${b}&season-b=${sb}&level-b=Top&k=5`))).toEqual(
      await cli(['match', a, b, '--season-b', String(sb), '--level-b', 'Top', '--k', '5']),
    );
  });
  it('for a want profile against a player', async () => {
    const [b] = rowsAt('C', 'Top')[0] ?? [''];
    expect(json(await get(`/api/match?want=pop_2b_s%3D1.95%2Cobp%3D55g&position=C&candidate=${b}`))).toEqual(
      await cli(['match', '--want', 'pop_2b_s=1.95,obp=55g', '--position', 'C', b]),
    );
  });
  it('refuses a missing candidate, an unknown level-b, want with a player, and answers 404 for an unknown candidate', async () => {
    const cases: [string, number, RegExp][] = [
      ['player=p000002', 400, /name the candidate/],
      ['player=p000002&candidate=p000003&level-b=ZZ', 400, /unknown level "ZZ"/],
      ['player=p000002&want=obp%3D60g&position=SS&candidate=p000003', 400, /^give either a player or want, not both$/],
      ['player=p000002&candidate=nobody-here', 404, /no player matches/],
      ['player=p000002&candidate=p000003&season-b=x', 400, /parameter season-b/],
    ];
    for (const [q, status, message] of cases) {
      const r = await get(`/api/match?${q}`);
      expect(r.status, q).toBe(status);
      expect(errorOf(r).message).toMatch(message);
    }
  });
});

describe('GET /api/backtest answers what `kindred backtest --format json` prints (one request table for both)', () => {
  const withoutTime = (x: unknown): unknown => ({ ...(x as Record<string, unknown>), seconds: null });
  it('for one position group at chosen cuts', async () => {
    const expected = await cli(['backtest', '--group', 'SP', '--cuts', '2018,2020']);
    const r = await get('/api/backtest?group=SP&cuts=2018,2020');
    expect(r.status).toBe(200);
    expect(withoutTime(json(r))).toEqual(withoutTime(expected));
    expect((json(r) as { kinds: { kind: string }[] }).kinds.map((k) => k.kind)).toEqual(['pitcher']);
  }, 120_000);
  it('refuses bad parameters with 400, and the files and formats of the command line', async () => {
    for (const [q, message] of [
      ['cuts=soon', /parameter cuts: expected a four-digit season/],
      ['group=catchers', /expected a position group .* or hitters or pitchers/],
      ['charts=%2Ftmp', /unknown parameter "charts"/],
      ['format=json', /unknown parameter "format"/],
    ] as [string, RegExp][]) {
      const r = await get(`/api/backtest?${q}`);
      expect(r.status, q).toBe(400);
      expect(errorOf(r).message).toMatch(message);
    }
  });
});
