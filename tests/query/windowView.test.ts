import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_WINDOW } from '../../src/query/defaultWindow.ts';
import { join } from 'node:path';
import { buildDemoStore, tempDir } from '../server/serverFixture.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import { windowView } from '../../src/query/windowView.ts';

describe('windowView', () => {
  let remove: () => Promise<void>;
  let storeDir: string;
  let store: ProfileStore;

  beforeAll(async () => {
    const t = await tempDir('kindred-window-view-');
    remove = t.remove;
    storeDir = join(t.dir, 'store');
    await buildDemoStore(storeDir);
    store = await openProfileStore(storeDir);
  }, 120_000);

  afterAll(async () => {
    await remove();
  });

  it('is the store itself for single seasons', () => {
    expect(windowView(store, 1)).toBe(store);
  });

  it('gives one view per store and window, so a server does not gather rows per answer', async () => {
    const view = windowView(store, DEFAULT_WINDOW);
    expect(windowView(store, DEFAULT_WINDOW)).toBe(view);
    const other = await openProfileStore(storeDir);
    expect(windowView(other, DEFAULT_WINDOW)).not.toBe(view);
  });

  it("finds every window row of a player, in the view's groups", () => {
    const view = windowView(store, DEFAULT_WINDOW);
    const [group, g] = [...view.groups][0] ?? [];
    if (!group || !g) throw new Error('the demo store has no 5-season window groups');
    const player = g.player[0] ?? -1;
    let expected = 0;
    for (const vg of view.groups.values()) for (let r = 0; r < vg.n; r++) if (vg.player[r] === player) expected++;
    const refs = view.rowsOf(player);
    expect(refs.length).toBe(expected);
    for (const { group: at, row } of refs) expect(view.groups.get(at)?.player[row]).toBe(player);
  });

  it('refuses a window the store was not built with, naming the ones it has', () => {
    expect(() => windowView(store, 7)).toThrow(/windows of 1, 5/);
  });
});
