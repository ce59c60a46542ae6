/**
 * Comps in a learned space through the library: ranking against a brute-force reference computed
 * independently (every row encoded again with the stored model, sorted by Euclidean distance),
 * index candidates against the exact scan, likeness against its formula, and a store whose files
 * disagree refused. Invented data (src/sim).
 */
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS, findCompsWithRows, LEARNED_SPACE_NOTE } from '../../src/query/findComps.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import { embeddingModelFromJSON } from '../../src/embed/EmbeddingModel.ts';
import { writeStore } from '../../src/store/writeStore.ts';
import { openStore } from '../../src/store/openStore.ts';
import { StoreError } from '../../src/errors/KindredError.ts';
import { sha256Hex } from '../../src/store/sha256Hex.ts';

let dir = '';
let store: ProfileStore;

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'kindred-embedded-query-'));
  const league = simulateLeague({ seed: 4242, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: 8000 });
  await writeLeagueCsv(league, join(dir, 'roster'));
  await buildStore(join(dir, 'roster'), join(dir, 'store'), { lenient: false, embed: { method: 'pca', driverTargets: 5, seed: 3 } });
  store = await openProfileStore(join(dir, 'store'));
}, 120_000);

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('findComps in a PCA space', () => {
  it('says why a preset other than the default is answered in the input space, and says nothing for the default', () => {
    const target = playerTarget(store, { group: 'SP', row: 0 });
    const asked = findCompsWithRows(store, target, { ...DEFAULT_COMPS_OPTIONS, k: 5, preset: 'stuff' }).result.query;
    expect(asked.space).toBe('input');
    expect(asked.space_note).toBe(LEARNED_SPACE_NOTE);
    const plain = findCompsWithRows(store, target, { ...DEFAULT_COMPS_OPTIONS, k: 5 }).result.query;
    expect(plain.space).toBe('pca');
    expect(plain).not.toHaveProperty('space_note');
  });

  it('ranks exactly as a brute-force scan of the re-encoded pool, one season per player', async () => {
    const g = store.groups.get('SP');
    if (!g?.embedding) throw new Error('no SP embedding');
    const model = embeddingModelFromJSON(JSON.parse(await readFile(join(dir, 'store', 'group-SP.model.json'), 'utf8')));
    const scale = g.embedding.summary.input_scale;
    const encode = (row: number): Float64Array =>
      model.model.encode(Float64Array.from(g.z.subarray(row * g.d, (row + 1) * g.d), (v, j) => v * (scale[j] ?? 1)));
    for (const row of [0, 137, 901]) {
      const target = playerTarget(store, { group: 'SP', row });
      const { result, rows } = findCompsWithRows(store, target, { ...DEFAULT_COMPS_OPTIONS, k: 10, exact: true, minCoverage: 0 });
      expect(result.query.space).toBe('pca');
      const t = encode(row);
      const best = new Map<number, { row: number; d2: number }>();
      for (let i = 0; i < g.n; i++) {
        const p = g.player[i] ?? -1;
        if (p === target.player) continue;
        const c = encode(i);
        const d2 = c.reduce((a, v, q) => a + (v - (t[q] ?? 0)) ** 2, 0);
        const prev = best.get(p);
        if (!prev || d2 < prev.d2 - 1e-12) best.set(p, { row: i, d2 });
      }
      const reference = [...best.values()].sort((a, b) => a.d2 - b.d2).slice(0, 10);
      expect(result.comps.map((c) => c.distance)).toEqual(reference.map((r) => Number(Math.sqrt(r.d2).toFixed(4))));
      expect(rows.length).toBe(10);
      // likeness = 100 exp(-d^2 / (2 s)), s the stored pair scale; likeness is shown to 0.1 and the
      // distance to 1e-4, so the recomputed value may differ by half a unit of 0.1 plus the distance's share
      for (const c of result.comps) expect(Math.abs(c.likeness - 100 * Math.exp(-(c.distance ** 2) / (2 * g.embedding.pairScale)))).toBeLessThanOrEqual(0.06);
    }
  });

  it('finds with the index (HNSW on the codes) nearly the comps the exact scan finds', () => {
    const g = store.groups.get('IF');
    if (!g) throw new Error('no IF group');
    let found = 0;
    let total = 0;
    for (const row of [3, 250, 800, 1500, 2100]) {
      const target = playerTarget(store, { group: 'IF', row });
      const fast = findCompsWithRows(store, target, { ...DEFAULT_COMPS_OPTIONS, k: 10, attributions: false });
      const slow = findCompsWithRows(store, target, { ...DEFAULT_COMPS_OPTIONS, k: 10, exact: true, attributions: false });
      expect(fast.result.query.method).toBe(g.n >= 2000 ? 'hnsw' : 'exact');
      const want = new Set(slow.rows);
      found += fast.rows.filter((r) => want.has(r)).length;
      total += want.size;
    }
    expect(found / total).toBeGreaterThanOrEqual(0.95);
  });

  it('skips the attributions when asked, with the same comps', () => {
    const target = playerTarget(store, { group: 'OF', row: 10 });
    const a = findCompsWithRows(store, target, { ...DEFAULT_COMPS_OPTIONS, exact: true });
    const b = findCompsWithRows(store, target, { ...DEFAULT_COMPS_OPTIONS, exact: true, attributions: false });
    expect(b.rows).toEqual(a.rows);
    expect(b.result.comps[0]?.attribution_total).toBeUndefined();
    expect(a.result.comps[0]?.attribution_total).toBeGreaterThanOrEqual(0);
  });

  it('answers in the input space with space "input" when asked', () => {
    const target = playerTarget(store, { group: 'OF', row: 10 });
    const r = findCompsWithRows(store, target, { ...DEFAULT_COMPS_OPTIONS, space: 'input' });
    expect(r.result.query.space).toBe('input');
    expect(r.result.query.method).toBe('exact'); // the index holds codes, so the input space is scanned
  });
});

describe('openProfileStore with an embedding', () => {
  it('refuses a store whose embedding summary disagrees with its group (checksums all valid)', async () => {
    const src = await openStore(join(dir, 'store'));
    const files = new Map<string, Uint8Array | string>();
    for (const name of Object.keys(src.manifest.files)) files.set(name, await src.readBytes(name));
    const summary = JSON.parse(await src.readText('group-RP.embedding.json')) as { dim: number };
    const edited = JSON.stringify({ ...summary, dim: summary.dim + 1 });
    files.set('group-RP.embedding.json', edited);
    // the group file names the summary by checksum: name the edited one, so only the shape check stands
    const group = JSON.parse(await src.readText('group-RP.json')) as { embedding: { sha256: { summary: string } } };
    group.embedding.sha256.summary = sha256Hex(new TextEncoder().encode(edited));
    files.set('group-RP.json', JSON.stringify(group));
    const bad = join(dir, 'disagreeing');
    await writeStore(bad, { params: src.manifest.params, files });
    await expect(openProfileStore(bad, { load: 'eager' })).rejects.toThrow(StoreError);
    await expect(openProfileStore(bad, { load: 'eager' })).rejects.toThrow(/group-RP\.embedding\.json: does not match the group: code size/);
    // a lazy open refuses it when the group is first read
    const lazy = await openProfileStore(bad);
    expect(() => lazy.groups.get('RP')).toThrow(/group-RP\.embedding\.json: does not match the group: code size/);
  });
});
