import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cp, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { buildDemoStore, tempDir } from '../server/serverFixture.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { resealStore } from '../helpers/resealStore.ts';

describe('openProfileStore with reuse (a reload)', () => {
  let root = '';
  let built = '';
  let remove: () => Promise<void> = async () => {};

  beforeAll(async () => {
    const t = await tempDir('kindred-reuse-');
    root = t.dir;
    remove = t.remove;
    built = join(root, 'built');
    await buildDemoStore(built);
  }, 120_000);

  afterAll(async () => remove());

  it('takes over the groups already read when their files are unchanged, and reads the others from the new files', async () => {
    const dir = join(root, 'same');
    await cp(built, dir, { recursive: true });
    const old = await openProfileStore(dir);
    const oldIf = old.groups.get('IF');
    const oldWindow = old.windows.get(3)?.get('IF');
    const next = await openProfileStore(dir, { reuse: old });
    expect(next.groups.get('IF')).toBe(oldIf);
    expect(next.windows.get(3)?.get('IF')).toBe(oldWindow);
    expect(next.opened.reads('group-IF.json'), 'not read again').toBe(0);
    // a group the old store never read is read now, verified
    expect(next.groups.get('C')?.n).toBe(next.groups.get('C')?.player.length);
    expect(next.opened.reads('group-C.json')).toBe(1);
  });

  it('reads a group again when one of its files changed (here resealed after a flip): the new files are checked, and refused', async () => {
    const dir = join(root, 'changed');
    await cp(built, dir, { recursive: true });
    const old = await openProfileStore(dir);
    expect(old.groups.get('IF')?.raw.length).toBeGreaterThan(0);
    const oldOf = old.groups.get('OF');
    const file = join(dir, 'group-IF.raw.f32');
    const bytes = await readFile(file);
    bytes[0] = (bytes[0] ?? 0) ^ 1;
    await writeFile(file, bytes);
    resealStore(dir, ['group-IF.raw.f32']);
    const next = await openProfileStore(dir, { reuse: old });
    expect(() => next.groups.get('IF')).toThrow(expect.objectContaining({ code: 'kindred.store.corrupt' }));
    expect(next.groups.get('OF'), 'an unchanged group is still taken over').toBe(oldOf);
  });
});
