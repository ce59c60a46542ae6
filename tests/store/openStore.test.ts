import { STORE_FORMAT_VERSION } from '../../src/store/manifest.ts';
import { mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { bytesToFloat32, float32ToBytes } from '../../src/store/float32Bytes.ts';
import { bytesToFloat64, float64ToBytes } from '../../src/store/float64Bytes.ts';
import { openStore } from '../../src/store/openStore.ts';
import { writeStore } from '../../src/store/writeStore.ts';
import { makeParent } from './storeFixture.ts';

let fixture: ReturnType<typeof makeParent>;
let dir: string;
const rows = new Float32Array([0.5, -1, 3.25, 1e-7]);
const weights = new Float64Array([Math.PI, -0, 1e300]);

beforeEach(async () => {
  fixture = makeParent();
  dir = join(fixture.parent, 'store');
  await writeStore(dir, {
    params: { dim: 2, note: 'ü' },
    files: new Map<string, Uint8Array | string>([
      ['rows.f32', float32ToBytes(rows)],
      ['weights.f64', float64ToBytes(weights)],
      ['names.json', JSON.stringify(['Ana Ödegaard', 'B. Vale'])],
    ]),
  });
});
afterEach(() => fixture.remove());

function editFile(name: string, edit: (bytes: Buffer) => Buffer): void {
  const path = join(dir, name);
  writeFileSync(path, edit(readFileSync(path)));
}

function editManifest(edit: (manifest: Record<string, unknown>) => void): void {
  const path = join(dir, 'manifest.json');
  const manifest: Record<string, unknown> = JSON.parse(readFileSync(path, 'utf8'));
  edit(manifest);
  writeFileSync(path, JSON.stringify(manifest));
}

describe('openStore(dir)', () => {
  it('round-trips params, text and numeric files exactly', async () => {
    const store = await openStore(dir);
    expect(store.manifest.params).toEqual({ dim: 2, note: 'ü' });
    expect(JSON.parse(await store.readText('names.json'))).toEqual(['Ana Ödegaard', 'B. Vale']);
    expect(bytesToFloat32(await store.readBytes('rows.f32'))).toEqual(rows);
    expect(Array.from(bytesToFloat64(await store.readBytes('weights.f64')))).toEqual(Array.from(weights));
    expect(store.path('rows.f32')).toBe(join(dir, 'rows.f32'));
  });

  for (const name of ['rows.f32', 'weights.f64', 'names.json']) {
    it(`refuses a flipped byte in ${name} with kindred.store.corrupt naming the file`, async () => {
      editFile(name, (bytes) => {
        const at = Math.floor(bytes.length / 2);
        bytes[at] = (bytes[at] ?? 0) ^ 0x01;
        return bytes;
      });
      await expect(openStore(dir)).rejects.toMatchObject({
        code: 'kindred.store.corrupt',
        message: expect.stringMatching(new RegExp(`${name.replace('.', '\\.')} has sha256 [0-9a-f]{64} \\(expected [0-9a-f]{64}`)),
      });
    });

    it(`refuses a truncated ${name} naming its size and the expected size`, async () => {
      const before = readFileSync(join(dir, name)).length;
      editFile(name, (bytes) => bytes.subarray(0, bytes.length - 1));
      await expect(openStore(dir)).rejects.toMatchObject({
        code: 'kindred.store.corrupt',
        message: expect.stringContaining(`${name} has ${before - 1} bytes (expected ${before} from the manifest)`),
      });
    });
  }

  it('refuses a deleted listed file and ignores an extra unlisted one', async () => {
    writeFileSync(join(dir, 'extra.bin'), 'not listed');
    await expect(openStore(dir)).resolves.toBeDefined();
    rmSync(join(dir, 'names.json'));
    await expect(openStore(dir)).rejects.toMatchObject({ code: 'kindred.store.corrupt', message: expect.stringContaining('names.json') });
  });

  it('re-verifies on read: a file changed after open is refused', async () => {
    const store = await openStore(dir);
    editFile('rows.f32', (bytes) => {
      bytes[0] = (bytes[0] ?? 0) ^ 0x80;
      return bytes;
    });
    await expect(store.readBytes('rows.f32')).rejects.toMatchObject({ code: 'kindred.store.corrupt' });
  });

  it('refuses a wrong version, saying which was found and which is expected', async () => {
    editManifest((m) => {
      m['version'] = STORE_FORMAT_VERSION + 1;
    });
    await expect(openStore(dir)).rejects.toMatchObject({
      code: 'kindred.store.version',
      message: expect.stringContaining(`version ${STORE_FORMAT_VERSION + 1}, expected kindred-store version ${STORE_FORMAT_VERSION}; rebuild the store`),
    });
  });

  it('refuses a manifest of another format with kindred.store.version', async () => {
    editManifest((m) => {
      m['format'] = 'other-thing';
    });
    await expect(openStore(dir)).rejects.toMatchObject({ code: 'kindred.store.version', message: expect.stringContaining('"other-thing"') });
  });

  it('refuses a missing folder or manifest with kindred.store.missing and says to build', async () => {
    await expect(openStore(join(fixture.parent, 'nowhere'))).rejects.toMatchObject({
      code: 'kindred.store.missing',
      message: expect.stringMatching(/no store at .*nowhere.*run kindred build/),
    });
    rmSync(join(dir, 'manifest.json'));
    await expect(openStore(dir)).rejects.toMatchObject({ code: 'kindred.store.missing' });
  });

  it('says a manifest that is there but cannot be read is unreadable, not missing (a full file table or a permission is not "no store")', async () => {
    rmSync(join(dir, 'manifest.json'));
    mkdirSync(join(dir, 'manifest.json')); // reading it fails with EISDIR, not ENOENT
    await expect(openStore(dir)).rejects.toMatchObject({
      code: 'kindred.store.corrupt',
      message: expect.stringMatching(/manifest\.json.*cannot be read \(EISDIR/),
    });
  });

  it('refuses a manifest that is not JSON, is badly shaped, or lists a path outside the store', async () => {
    writeFileSync(join(dir, 'manifest.json'), '{"format": "kindred-store", ');
    await expect(openStore(dir)).rejects.toMatchObject({ code: 'kindred.store.corrupt', message: expect.stringContaining('not valid JSON') });
    // a folder whose manifest does not parse is not replaced by a build: start from an empty one
    rmSync(dir, { recursive: true, force: true });
    await writeStore(dir, { params: {}, files: new Map([['a.txt', 'a']]) });
    editManifest((m) => {
      m['files'] = { 'a.txt': { sha256: 'xyz', bytes: 1 } };
    });
    await expect(openStore(dir)).rejects.toMatchObject({ code: 'kindred.store.corrupt', message: expect.stringContaining('files.a.txt.sha256') });
    editManifest((m) => {
      m['files'] = { '../a.txt': { sha256: '0'.repeat(64), bytes: 1 } };
    });
    await expect(openStore(dir)).rejects.toThrow(/folder separator/);
  });

  it('refuses to read a file the manifest does not list', async () => {
    const store = await openStore(dir);
    await expect(store.readBytes('other.bin')).rejects.toMatchObject({ code: 'kindred.store.missing' });
    expect(() => store.path('other.bin')).toThrow(/lists no file "other.bin"/);
  });
});
