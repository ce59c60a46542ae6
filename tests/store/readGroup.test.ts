/**
 * What readGroup refuses once the checksum check has been bypassed (the manifest rewritten to match
 * edited files): files swapped between groups, the raw and standardised matrices swapped within one
 * group, and player or level references past the store's tables.
 */
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { groupEmbeddingFileNames, groupFileNames } from '../../src/store/storeFileNames.ts';
import { resealStore, swapStoreFiles } from '../helpers/resealStore.ts';
import { groupFileSchema } from '../../src/store/groupFile.ts';
import { decodeColumns, encodeColumns, type ColumnInput } from '../../src/store/columnsFile.ts';
import { decodePlayersFile } from '../../src/store/playersFile.ts';

let work: string;
let built: string;
let builtPca: string;
let copies = 0;

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), 'kindred-readgroup-'));
  const league = simulateLeague({ seed: 31, firstSeason: 2018, lastSeason: 2026, targetPlayerSeasons: 900 });
  await writeLeagueCsv(league, join(work, 'roster'));
  built = join(work, 'built');
  // narrow indexes over as few as 50 rows, so that this small league has them (the default needs 5,000)
  await buildStore(join(work, 'roster'), built, { lenient: false, threads: 1, narrowMin: { rows: 50, targets: 10 } });
  builtPca = join(work, 'built-pca');
  await buildStore(join(work, 'roster'), builtPca, { lenient: false, threads: 1, embed: { method: 'pca', driverTargets: 0 } });
}, 240_000);
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** A fresh copy of the built store (input space, or PCA) to damage. */
function copy(from: 'input' | 'pca' = 'input'): string {
  const dir = join(work, `copy-${copies++}`);
  cpSync(from === 'pca' ? builtPca : built, dir, { recursive: true });
  return dir;
}

/** Rewrites one i32 column of a group's rows file (group-<G>.rows.bin) and reseals the manifest. */
function editRows(dir: string, group: 'OF' | 'C', column: 'player' | 'level', edit: (values: Int32Array) => void): void {
  const name = groupFileNames(group).rows;
  const path = join(dir, name);
  const cols = decodeColumns(readFileSync(path), name);
  const columns: ColumnInput[] = [];
  for (const c of ['player', 'season', 'level', 'sample', 'team', 'partition_rows'] as const) {
    const values = Int32Array.from(cols.i32(c));
    if (c === column) edit(values);
    columns.push({ name: c, type: 'i32', values });
  }
  columns.push({ name: 'position', type: 'u8', values: cols.u8('position') });
  columns.push({ name: 'age', type: 'f64', values: cols.f64('age') });
  columns.push({ name: 'outs', type: 'f64', values: cols.f64('outs') });
  columns.push({ name: 'team_name', type: 'strings', values: cols.strings('team_name') });
  writeFileSync(path, encodeColumns(columns));
  resealStore(dir, [name]);
}

describe('readGroup behind a rewritten manifest', () => {
  it('opens the stores as built', async () => {
    expect((await openProfileStore(copy('pca'))).groups.get('SP')?.embedding?.space).toBe('pca');
    const store = await openProfileStore(copy());
    expect(store.groups.get('SP')?.n).toBeGreaterThan(0);
    expect(store.groups.get('RP')?.n).toBeGreaterThan(0);
  });

  it('refuses the SP and RP group files swapped (it used to serve relievers as starters)', async () => {
    const dir = copy();
    const sp = groupFileNames('SP');
    const rp = groupFileNames('RP');
    for (const kind of ['json', 'raw', 'z'] as const) swapStoreFiles(dir, sp[kind], rp[kind], true);
    await expect(openProfileStore(dir, { load: 'eager' })).rejects.toMatchObject({
      code: 'kindred.store.corrupt',
      message: expect.stringMatching(/group-SP\.json: holds group RP \(expected SP; files swapped\?\)/),
    });
  });

  it('refuses the raw and standardised matrices of one group swapped (same size, so only their checksums in the group file tell them apart)', async () => {
    const dir = copy();
    const names = groupFileNames('IF');
    expect(readFileSync(join(dir, names.raw)).length).toBe(readFileSync(join(dir, names.z)).length);
    swapStoreFiles(dir, names.raw, names.z, true);
    await expect(openProfileStore(dir, { load: 'eager' })).rejects.toMatchObject({
      code: 'kindred.store.corrupt',
      message: expect.stringMatching(/group-IF\.json: names group-IF\.raw\.f32 with sha256 [0-9a-f]{64}, but the store holds [0-9a-f]{64} \(files swapped\?\)/),
    });
  });

  for (const kind of ['model', 'summary', 'codes'] as const) {
    it(`refuses the SP and RP embedding ${kind} files swapped (same shapes; found by the fuzz suite for the model)`, async () => {
      const dir = copy('pca');
      const sp = groupEmbeddingFileNames('SP')[kind];
      const rp = groupEmbeddingFileNames('RP')[kind];
      swapStoreFiles(dir, sp, rp, true);
      await expect(openProfileStore(dir, { load: 'eager' })).rejects.toMatchObject({
        code: 'kindred.store.corrupt',
        message: expect.stringMatching(/names group-(SP|RP)\.[a-z]+\.[a-z0-9]+ with sha256 [0-9a-f]{64}, but the store holds [0-9a-f]{64} \(files swapped\?\)/),
      });
    });
  }

  it('refuses a narrow index whose row count is not that of the wider partitions', async () => {
    const dir = copy();
    const group = (['OF', 'IF', 'C'] as const).find((g) => groupFileSchema.parse(JSON.parse(readFileSync(join(dir, groupFileNames(g).json), 'utf8'))).partitions.some((p) => p.narrow));
    expect(group, 'a group with a narrow index').toBeDefined();
    const names = groupFileNames(group ?? 'OF');
    const file = groupFileSchema.parse(JSON.parse(readFileSync(join(dir, names.json), 'utf8')));
    const partitions = file.partitions.map((p) => (p.narrow ? { ...p, narrow: { ...p.narrow, count: p.narrow.count + 1 } } : p));
    writeFileSync(join(dir, names.json), JSON.stringify({ ...file, partitions }));
    resealStore(dir, [names.json]);
    await expect(openProfileStore(dir, { load: 'eager' })).rejects.toMatchObject({
      code: 'kindred.store.corrupt',
      message: expect.stringContaining('narrow index metadata does not match'),
    });
  });

  it('refuses a row naming a player past the players table', async () => {
    const dir = copy();
    const players = decodePlayersFile(readFileSync(join(dir, 'players.bin')), 'players.bin').players.length;
    editRows(dir, 'OF', 'player', (player) => {
      player[0] = players;
    });
    await expect(openProfileStore(dir, { load: 'eager' })).rejects.toMatchObject({
      code: 'kindred.store.corrupt',
      message: expect.stringContaining(`row 0 names player ${players} (the store has ${players})`),
    });
  });

  it('refuses a row naming a level past the level list', async () => {
    const dir = copy();
    editRows(dir, 'C', 'level', (level) => {
      level[1] = 99;
    });
    await expect(openProfileStore(dir, { load: 'eager' })).rejects.toMatchObject({
      code: 'kindred.store.corrupt',
      message: expect.stringMatching(/row 1 names level 99 \(the store has \d+\)/),
    });
  });
});
