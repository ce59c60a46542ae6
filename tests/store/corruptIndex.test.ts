import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { makeParent } from './storeFixture.ts';

const fixture = makeParent();
afterAll(() => fixture.remove());

describe('a store whose hnsw index body was corrupted at the same length', () => {
  it('is refused with kindred.store.corrupt and the process ends normally, not by a signal', () => {
    const script = fileURLToPath(new URL('./corruptIndexChild.ts', import.meta.url));
    const child = spawnSync(process.execPath, ['--import', 'tsx', script, fixture.parent], {
      cwd: fileURLToPath(new URL('../..', import.meta.url)),
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(child.signal, child.stderr).toBeNull();
    expect(child.status, child.stderr).toBe(0);
    expect(child.stdout.trim().split('\n')).toEqual(['store kindred.store.corrupt', 'direct kindred.store.corrupt']);
  });
});
