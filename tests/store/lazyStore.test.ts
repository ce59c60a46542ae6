/**
 * openProfileStore reads lazily: the same answers as an eager open, each file verified once when it
 * is first read, a file damaged after the open refused by the read that meets it (same code as an
 * open would give), and a store folder replaced meanwhile (a rebuild) never mixed in. Invented data
 * (src/sim).
 */
import { cp, readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POSITION_GROUPS } from '../../src/profiles/positionGroup.ts';
import { DEFAULT_COMPS_OPTIONS, findComps } from '../../src/query/findComps.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import { windowView } from '../../src/query/windowView.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import { StoreHolder } from '../../src/server/StoreHolder.ts';
import { simStore, type SimStore } from '../helpers/simStore.ts';
import { DEFAULT_WINDOW } from '../../src/query/defaultWindow.ts';

let sim: SimStore;
let other: SimStore;

beforeAll(async () => {
  sim = await simStore(10000, 4242);
  other = await simStore(3000, 77);
}, 240_000);

afterAll(async () => {
  await rm(sim.dir, { recursive: true, force: true });
  await rm(other.dir, { recursive: true, force: true });
});

/** JSON answers for a spread of targets in every group (player targets, index and exact). */
function answers(store: ProfileStore): string[] {
  const out: string[] = [];
  for (const group of POSITION_GROUPS) {
    const g = store.groups.get(group);
    if (!g) continue;
    for (const row of [0, Math.floor(g.n / 3), g.n - 1]) {
      const target = playerTarget(store, { group, row });
      out.push(JSON.stringify(findComps(store, target, DEFAULT_COMPS_OPTIONS)));
      out.push(JSON.stringify(findComps(store, target, { ...DEFAULT_COMPS_OPTIONS, exact: true })));
    }
  }
  return out;
}

async function copyOf(from: string, name: string): Promise<string> {
  const dir = join(sim.dir, name);
  await cp(from, dir, { recursive: true });
  return dir;
}

async function flipByte(file: string, at: (length: number) => number): Promise<void> {
  const bytes = await readFile(file);
  const i = at(bytes.length);
  bytes[i] = (bytes[i] ?? 0) ^ 0x20;
  await writeFile(file, bytes); // in place: the same file, as a disk fault or a stray write would leave it
}

describe('openProfileStore (lazy by default)', () => {
  it('answers byte for byte the same JSON as an eager open', async () => {
    const lazy = await openProfileStore(sim.storeDir);
    const eager = await openProfileStore(sim.storeDir, { load: 'eager' });
    const a = answers(lazy);
    expect(a.length).toBeGreaterThan(12);
    expect(a).toEqual(answers(eager));
  });

  it('reads nothing of a group until it is asked for, then all of it, and verifies each file once', async () => {
    const store = await openProfileStore(sim.storeDir);
    const files = Object.keys(store.opened.manifest.files);
    expect(files.filter((f) => f.startsWith('group-')).every((f) => store.opened.reads(f) === 0)).toBe(true);
    expect(store.opened.reads('players.bin')).toBe(1);
    const g = store.groups.get('IF');
    if (!g) throw new Error('no IF group');
    // the group is read whole when first asked for (so any damaged file of it is refused then)
    // (its windows, group-IF.w5.*, are another group to the store: read when a query over windows asks for them)
    const single = files.filter((x) => x.startsWith('group-IF.') && !/^group-IF\.w\d+\./.test(x));
    for (const f of single) expect([f, store.opened.reads(f)]).toEqual([f, 1]);
    for (const f of files.filter((x) => x.startsWith('group-IF.w'))) expect([f, store.opened.reads(f)]).toEqual([f, 0]);
    const windows = store.windows.get(5)?.get('IF');
    expect(windows?.window?.size).toBe(5);
    for (const f of files.filter((x) => x.startsWith('group-IF.w5.'))) expect([f, store.opened.reads(f)]).toEqual([f, 1]);
    for (const row of [1, 2, 3]) findComps(store, playerTarget(store, { group: 'IF', row }), DEFAULT_COMPS_OPTIONS);
    expect(store.opened.reads('group-IF.z.f32')).toBe(1);
    expect(store.opened.reads('group-OF.json')).toBe(0);
    answers(store);
    answers(store);
    store.outcomes();
    store.outcomes();
    // every file once, but the windows of the groups no query over windows asked for (never)
    for (const f of files) expect([f, store.opened.reads(f)]).toEqual([f, /^group-[A-Z]+\.w\d+\./.test(f) && !f.startsWith('group-IF.w') ? 0 : 1]);
  });

  it("finds a player's seasons and windows from the players file: a windowed target reads only its own window group", async () => {
    const store = await openProfileStore(sim.storeDir);
    const eager = await openProfileStore(sim.storeDir, { load: 'eager' });
    const view = windowView(store, DEFAULT_WINDOW);
    const eagerView = windowView(eager, DEFAULT_WINDOW);
    const player = eagerView.groups.get('OF')?.player[5];
    if (player === undefined) throw new Error('no OF windows');
    // the scan over every window group that the players file replaces
    const scanned: string[] = [];
    for (const [group, g] of eagerView.groups) for (let row = 0; row < g.n; row++) if (g.player[row] === player) scanned.push(`${group} ${row}`);
    expect(view.rowsOf(player).map((r) => `${r.group} ${r.row}`)).toEqual(scanned);
    const files = Object.keys(store.opened.manifest.files);
    expect(files.filter((f) => f.startsWith('group-')).every((f) => store.opened.reads(f) === 0)).toBe(true);
    const target = playerTarget(view, { group: 'OF', row: 5 });
    expect(JSON.stringify(findComps(view, target, DEFAULT_COMPS_OPTIONS))).toEqual(JSON.stringify(findComps(eagerView, playerTarget(eagerView, { group: 'OF', row: 5 }), DEFAULT_COMPS_OPTIONS)));
    const read = files.filter((f) => store.opened.reads(f) > 0 && f.startsWith('group-'));
    expect(read.length).toBeGreaterThan(0);
    expect(read.every((f) => f.startsWith(`group-OF.w${DEFAULT_WINDOW}.`))).toBe(true);
  });

  it('refuses a file damaged after the open when it is first read, with the code an open gives', async () => {
    // the largest group with an index file
    const files = Object.keys((await openProfileStore(sim.storeDir)).opened.manifest.files);
    const group = POSITION_GROUPS.find((g) => files.includes(`group-${g}.p0.hnsw`));
    if (!group) throw new Error('the test league has no partition index');
    const untouched = POSITION_GROUPS.find((g) => g !== group && files.includes(`group-${g}.json`));
    if (!untouched) throw new Error('the test league has one group only');
    const damages: readonly (readonly [string, (n: number) => number])[] = [
      [`group-${group}.z.f32`, (n) => n >> 1],
      [`group-${group}.p0.hnsw`, (n) => n - 3],
      [`group-${group}.rows.bin`, (n) => n - 1],
      [`group-${group}.json`, (n) => n >> 1],
    ];
    for (const [file, at] of damages) {
      const dir = await copyOf(sim.storeDir, `damaged-${file}`);
      const store = await openProfileStore(dir);
      await flipByte(join(dir, file), at);
      const query = (): unknown => findComps(store, playerTarget(store, { group, row: 0 }), DEFAULT_COMPS_OPTIONS);
      expect(query).toThrow(expect.objectContaining({ code: 'kindred.store.corrupt', message: expect.stringContaining(file) }));
      // and again on the next query: a refused file is never taken as read
      expect(query).toThrow(expect.objectContaining({ code: 'kindred.store.corrupt' }));
      // the same damage met by an eager open
      await expect(openProfileStore(dir, { load: 'eager' })).rejects.toMatchObject({ code: 'kindred.store.corrupt', message: expect.stringContaining(file) });
      // groups the damage does not touch still answer
      expect(findComps(store, playerTarget(store, { group: untouched, row: 0 }), DEFAULT_COMPS_OPTIONS).comps.length).toBeGreaterThan(0);
    }
  });

  it('refuses at open a listed file that is missing or of the wrong size', async () => {
    const dir = await copyOf(sim.storeDir, 'short');
    const file = join(dir, 'group-OF.raw.f32');
    await writeFile(file, (await readFile(file)).subarray(4));
    await expect(openProfileStore(dir)).rejects.toMatchObject({ code: 'kindred.store.corrupt', message: expect.stringContaining('group-OF.raw.f32') });
    await rm(file);
    await expect(openProfileStore(dir)).rejects.toMatchObject({ code: 'kindred.store.corrupt', message: expect.stringContaining('group-OF.raw.f32') });
  });

  it('answers from the files it opened when a rebuild replaces the store folder, and a reload takes the new one', async () => {
    const dir = await copyOf(sim.storeDir, 'replaced');
    const before = answers(await openProfileStore(sim.storeDir, { load: 'eager' }));
    const holder = await StoreHolder.open(dir);
    const first = holder.current.store;
    // a rebuild swaps another store in by renames while the server holds the old one, untouched so far
    await rm(dir, { recursive: true });
    await cp(other.storeDir, dir, { recursive: true });
    expect(answers(first)).toEqual(before);
    const next = await holder.reload();
    expect(answers(next.store)).toEqual(answers(other.store));
  });
});
