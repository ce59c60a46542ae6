import { readFileSync, readdirSync, writeFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { StoreError } from '../../src/errors/KindredError.ts';
import { float32ToBytes } from '../../src/store/float32Bytes.ts';
import { openStore } from '../../src/store/openStore.ts';
import { sha256Hex } from '../../src/store/sha256Hex.ts';
import { writeStore } from '../../src/store/writeStore.ts';
import { STORE_FORMAT_VERSION } from '../../src/store/manifest.ts';
import { makeParent } from './storeFixture.ts';

let fixture: ReturnType<typeof makeParent>;
let dir: string;
beforeEach(() => {
  fixture = makeParent();
  dir = join(fixture.parent, 'store');
});
afterEach(() => fixture.remove());

const input = (tag: string) => ({
  params: { dim: 3, tag },
  files: new Map<string, Uint8Array | string>([
    ['rows.f32', float32ToBytes(new Float32Array([1, 2, 3]))],
    ['names.json', JSON.stringify([tag])],
  ]),
});

describe('writeStore(dir, input)', () => {
  it('writes the files and a manifest with format, version, params, sizes and sha256 (FIPS 180-4 digest)', async () => {
    const manifest = await writeStore(dir, input('a'));
    expect(readdirSync(dir).sort()).toEqual(['manifest.json', 'names.json', 'rows.f32']);
    const onDisk: unknown = JSON.parse(readFileSync(join(dir, 'manifest.json'), 'utf8'));
    expect(onDisk).toEqual(manifest);
    expect(manifest).toMatchObject({ format: 'kindred-store', version: STORE_FORMAT_VERSION, params: { dim: 3, tag: 'a' } });
    expect(manifest.files['rows.f32']).toEqual({ bytes: 12, sha256: sha256Hex(readFileSync(join(dir, 'rows.f32'))) });
    expect(Number.isNaN(Date.parse(manifest.createdAt))).toBe(false);
    expect(fixture.leftovers()).toEqual(['store']);
  });

  it('replaces an existing store whole and leaves no backup or temp folder', async () => {
    await writeStore(dir, input('old'));
    await writeStore(dir, { params: { tag: 'new' }, files: new Map([['only.txt', 'x']]) });
    const store = await openStore(dir);
    expect(store.manifest.params).toEqual({ tag: 'new' });
    expect(readdirSync(dir).sort()).toEqual(['manifest.json', 'only.txt']);
    expect(fixture.leftovers()).toEqual(['store']);
  });

  it('refuses a file name with a slash, leaving the old store intact and no temp folder', async () => {
    await writeStore(dir, input('old'));
    const bad = { params: {}, files: new Map([['sub/rows.f32', 'x']]) };
    await expect(writeStore(dir, bad)).rejects.toMatchObject({ code: 'kindred.store.writeFailed', message: expect.stringContaining('folder separator') });
    expect((await openStore(dir)).manifest.params).toEqual({ dim: 3, tag: 'old' });
    expect(fixture.leftovers()).toEqual(['store']);
  });

  it('refuses the reserved name manifest.json and params that are not JSON', async () => {
    await expect(writeStore(dir, { params: {}, files: new Map([['manifest.json', '{}']]) })).rejects.toThrow(/reserved/);
    await expect(writeStore(dir, { params: { n: 1n }, files: new Map() })).rejects.toThrow(/not JSON-serialisable/);
  });

  it('cleans up when a file fails half-way (a name too long for the file system) and keeps the old store', async () => {
    await writeStore(dir, input('old'));
    const files = new Map<string, string>([['a.txt', 'first'], ['z'.repeat(300), 'too long']]);
    await expect(writeStore(dir, { params: {}, files })).rejects.toBeInstanceOf(StoreError);
    expect((await openStore(dir)).manifest.params).toEqual({ dim: 3, tag: 'old' });
    expect(fixture.leftovers()).toEqual(['store']);
  });

  it('fails with kindred.store.writeFailed when the parent folder does not exist, leaving nothing', async () => {
    await expect(writeStore(join(fixture.parent, 'missing', 'store'), input('a'))).rejects.toMatchObject({
      code: 'kindred.store.writeFailed',
      message: expect.stringContaining('ENOENT'),
    });
    expect(fixture.leftovers()).toEqual([]);
  });

  it('refuses to replace a folder that is not a store (it would be deleted) or a plain file', async () => {
    mkdirSync(dir);
    writeFileSync(join(dir, 'notes.txt'), 'keep me');
    await expect(writeStore(dir, input('a'))).rejects.toThrow(/no manifest.json/);
    expect(readFileSync(join(dir, 'notes.txt'), 'utf8')).toBe('keep me');
    writeFileSync(join(fixture.parent, 'plain'), 'x');
    await expect(writeStore(join(fixture.parent, 'plain'), input('a'))).rejects.toThrow(/a file of that name exists/);
  });
});
