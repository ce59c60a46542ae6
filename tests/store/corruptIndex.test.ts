import { type SpawnSyncReturns, spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { makeParent } from './storeFixture.ts';

const fixture = makeParent();
afterAll(() => fixture.remove());

const runChild = (mode: string): SpawnSyncReturns<string> => {
  const script = fileURLToPath(new URL('./corruptIndexChild.ts', import.meta.url));
  const work = join(fixture.parent, mode);
  mkdirSync(work);
  return spawnSync(process.execPath, ['--import', 'tsx', script, work, mode], {
    cwd: fileURLToPath(new URL('../..', import.meta.url)),
    encoding: 'utf8',
    timeout: 60_000,
  });
};

describe('a store whose hnsw index body was corrupted at the same length', () => {
  it('is refused with kindred.store.corrupt and the process ends normally, not by a signal', () => {
    const child = runChild('body');
    expect(child.signal, child.stderr).toBeNull();
    expect(child.status, child.stderr).toBe(0);
    expect(child.stdout.trim().split('\n')).toEqual(['store kindred.store.corrupt', 'direct kindred.store.corrupt']);
  });
});

describe('a store whose hnsw entry point names an element without upper layers, checksum rewritten in the manifest', () => {
  it('is refused by the index check before the native reader runs (it used to end the process by SIGSEGV)', () => {
    const child = runChild('entry-point');
    expect(child.signal, child.stderr).toBeNull();
    expect(child.status, child.stderr).toBe(0);
    expect(child.stdout.trim().split('\n')).toEqual(['store kindred.store.corrupt', 'direct kindred.store.corrupt']);
  });
});


describe('a store whose hnsw capacity (maxElements) is one below its count, checksum rewritten in the manifest', () => {
  it('is refused by the index check before the native reader runs (found by the fuzz suite: it aborted the process, malloc(): invalid size)', () => {
    const child = runChild('max-elements');
    expect(child.signal, child.stderr).toBeNull();
    expect(child.status, child.stderr).toBe(0);
    expect(child.stdout.trim().split('\n')).toEqual(['store kindred.store.corrupt', 'direct kindred.store.corrupt']);
  });
});
