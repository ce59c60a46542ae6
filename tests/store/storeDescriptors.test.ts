import { closeSync, existsSync, fstatSync, openSync, readdirSync, readlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { collectGarbage } from '../../src/pipeline/collectGarbage.ts';
import { float32ToBytes } from '../../src/store/float32Bytes.ts';
import { openStore } from '../../src/store/openStore.ts';
import { writeStore } from '../../src/store/writeStore.ts';
import { makeParent } from './storeFixture.ts';

// Which files the process holds open, from Linux's /proc/self/fd (one symlink per descriptor).
const PROC_FDS = '/proc/self/fd';

function descriptorsUnder(dir: string): number[] {
  const found: number[] = [];
  for (const name of readdirSync(PROC_FDS)) {
    try {
      if (readlinkSync(join(PROC_FDS, name)).startsWith(dir)) found.push(Number(name));
    } catch {
      // closed between the listing and the read
    }
  }
  return found;
}

async function collectAndSettle(): Promise<void> {
  for (let i = 0; i < 5; i++) {
    collectGarbage();
    await new Promise((done) => setTimeout(done, 20));
  }
}

let fixture: ReturnType<typeof makeParent>;
let dir: string;

beforeEach(async () => {
  fixture = makeParent();
  dir = join(fixture.parent, 'store');
  await writeStore(dir, {
    params: { dim: 2 },
    files: new Map<string, Uint8Array | string>([
      ['a.f32', float32ToBytes(new Float32Array([1, 2]))],
      ['b.f32', float32ToBytes(new Float32Array([3, 4]))],
    ]),
  });
});
afterEach(() => fixture.remove());

describe.skipIf(!existsSync(PROC_FDS))('a lazily opened store and its file descriptors', () => {
  it('closes the files of a store dropped without close() once collected, and never a number reused after close()', async () => {
    // A store closed by hand: its descriptor numbers are free again, and the next open takes one of them.
    let closed: Awaited<ReturnType<typeof openStore>> | null = await openStore(dir, { verify: 'read' });
    const closedFds = descriptorsUnder(dir);
    expect(closedFds).toHaveLength(2);
    closed.close();
    closed = null;
    const other = join(fixture.parent, 'other.txt');
    writeFileSync(other, 'kept open');
    const reused = openSync(other, 'r');
    expect(closedFds).toContain(reused);
    // A store dropped without close(): only the collector can close its files.
    let dropped: Awaited<ReturnType<typeof openStore>> | null = await openStore(dir, { verify: 'read' });
    expect(descriptorsUnder(dir)).toHaveLength(2);
    dropped = null;
    expect(dropped).toBeNull();
    await collectAndSettle();
    try {
      // the collector did run: the dropped store's files are closed ...
      expect(descriptorsUnder(dir)).toEqual([]);
      // ... and the number the closed store gave back, now another file's, is still open
      expect(fstatSync(reused).size).toBe('kept open'.length);
      expect(readlinkSync(join(PROC_FDS, String(reused)))).toBe(other);
    } finally {
      closeSync(reused);
    }
  });
});
