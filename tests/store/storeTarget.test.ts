import { spawnSync } from 'node:child_process';
import { existsSync, lstatSync, mkdirSync, readFileSync, readdirSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { openStore } from '../../src/store/openStore.ts';
import { checkStoreTarget, cleanLeftovers, lockFileOf, lockStore } from '../../src/store/storeTarget.ts';
import { writeStore } from '../../src/store/writeStore.ts';
import { makeParent } from './storeFixture.ts';

let fixture: ReturnType<typeof makeParent>;
beforeEach(() => {
  fixture = makeParent();
});
afterEach(() => fixture.remove());

const input = { params: { tag: 'x' }, files: new Map<string, string>([['a.json', '[1]']]) };

/** The pid of a process that has ended (a child that exited at once). */
function deadPid(): number {
  const child = spawnSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))'], { encoding: 'utf8' });
  return Number(child.stdout);
}

describe('checkStoreTarget(dir) and the build', () => {
  it('does not replace a folder whose manifest.json is not a Kindred manifest (the app folder keeps its code)', async () => {
    const app = join(fixture.parent, 'app');
    mkdirSync(join(app, 'src'), { recursive: true });
    writeFileSync(join(app, 'manifest.json'), '{"name":"my app"}');
    writeFileSync(join(app, 'src', 'app.js'), 'code');
    await expect(buildStore('demo-roster', app, { lenient: false })).rejects.toMatchObject({ code: 'kindred.store.writeFailed' });
    await expect(writeStore(app, input)).rejects.toThrow(/no manifest\.json of a Kindred store/);
    expect(readFileSync(join(app, 'src', 'app.js'), 'utf8')).toBe('code');
  });

  it('does not replace a Kindred store holding entries Kindred did not write, and names them', async () => {
    const dir = join(fixture.parent, 'store');
    await writeStore(dir, input);
    writeFileSync(join(dir, 'notes.txt'), 'mine');
    await expect(writeStore(dir, input)).rejects.toThrow(/entries Kindred did not write \(notes\.txt\)/);
    expect(readFileSync(join(dir, 'notes.txt'), 'utf8')).toBe('mine');
  });

  it('refuses a symbolic link deliberately, naming its target, and leaves the link a link', async () => {
    const real = join(fixture.parent, 'real');
    await writeStore(real, input);
    const link = join(fixture.parent, 'link');
    symlinkSync(real, link);
    await expect(checkStoreTarget(link)).rejects.toThrow(/symbolic link to .*real; Kindred does not replace or follow links/);
    await expect(writeStore(link, input)).rejects.toMatchObject({ code: 'kindred.store.writeFailed' });
    expect(lstatSync(link).isSymbolicLink()).toBe(true);
  });

  it('checks the parent folder before any work (a missing parent fails at once, before the roster is read)', async () => {
    const started = performance.now();
    await expect(buildStore('no-such-roster', join(fixture.parent, 'missing', 'store'), { lenient: false })).rejects.toThrow(/parent folder .* is missing or not writable/);
    expect(performance.now() - started).toBeLessThan(5000);
    expect(fixture.leftovers()).toEqual([]);
  });
});

describe('lockStore(dir): one build at a time', () => {
  it('refuses a second build while the first holds the lock, naming its pid, and frees it on release', async () => {
    const dir = join(fixture.parent, 'store');
    const lock = await lockStore(dir);
    expect(readFileSync(lockFileOf(dir), 'utf8').trim()).toBe(String(process.pid));
    await expect(lockStore(dir)).rejects.toMatchObject({ code: 'kindred.store.locked', message: expect.stringContaining(`pid ${process.pid}`) });
    await expect(buildStore('demo-roster', dir, { lenient: false })).rejects.toMatchObject({ code: 'kindred.store.locked' });
    await lock.release();
    expect(existsSync(lockFileOf(dir))).toBe(false);
    await (await lockStore(dir)).release();
  });

  it('takes over a stale lock whose holder is no longer running', async () => {
    const dir = join(fixture.parent, 'store');
    writeFileSync(lockFileOf(dir), `${deadPid()}\n`);
    const lock = await lockStore(dir);
    expect(readFileSync(lockFileOf(dir), 'utf8').trim()).toBe(String(process.pid));
    await lock.release();
  });
});

describe('cleanLeftovers(dir)', () => {
  it('removes temp and backup folders of killed builds (store and charts), keeping the store and unrelated folders', async () => {
    const dir = join(fixture.parent, 'store');
    await writeStore(dir, input);
    const pid = deadPid();
    for (const name of [`store.tmp-${pid}-0a1b2c3d`, `store.old-${pid}-0a1b2c3d`, `store.charts.tmp-${pid}-00000000`, 'store-notes', `other.tmp-${pid}-0a1b2c3d`]) {
      mkdirSync(join(fixture.parent, name));
    }
    const removed = await cleanLeftovers(dir);
    expect(removed.sort()).toEqual([`store.charts.tmp-${pid}-00000000`, `store.old-${pid}-0a1b2c3d`, `store.tmp-${pid}-0a1b2c3d`]);
    expect(readdirSync(fixture.parent).sort()).toEqual([`other.tmp-${pid}-0a1b2c3d`, 'store', 'store-notes']);
  });

  it('puts back the old store when a build was killed between its two renames', async () => {
    const pid = deadPid();
    const backup = join(fixture.parent, `store.old-${pid}-0a1b2c3d`);
    await writeStore(backup, input);
    await cleanLeftovers(join(fixture.parent, 'store'));
    expect((await openStore(join(fixture.parent, 'store'))).manifest.params).toEqual({ tag: 'x' });
    expect(fixture.leftovers()).toEqual(['store']);
  });
});
