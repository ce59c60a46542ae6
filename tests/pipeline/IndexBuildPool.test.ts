import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { IndexBuildPool } from '../../src/pipeline/IndexBuildPool.ts';
import { manifestSchema } from '../../src/store/manifest.ts';
import { randomVectors } from '../ann/randomVectors.ts';
import { KindredError } from '../../src/errors/KindredError.ts';

let dir = '';
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'kindred-pool-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

const params = { M: 16, efConstruction: 50, ef: 64, seed: 100 };

describe('IndexBuildPool', () => {
  it('builds in worker threads the same index files, byte for byte, as in this thread (same seed and insertion order)', async () => {
    const pool = new IndexBuildPool(2);
    const local = new IndexBuildPool(1);
    try {
      const sizes = [1500, 400, 900];
      const inThread = await Promise.all(sizes.map((n, i) => local.build(randomVectors(n, 6, i + 1), 6, params, join(dir, `local-${i}.bin`))));
      const inWorkers = await Promise.all(sizes.map((n, i) => pool.build(randomVectors(n, 6, i + 1), 6, params, join(dir, `worker-${i}.bin`))));
      inWorkers.forEach((bytes, i) => {
        expect(bytes.byteLength).toBeGreaterThan(0);
        expect(Buffer.compare(Buffer.from(bytes), Buffer.from(inThread[i] as Uint8Array))).toBe(0);
      });
    } finally {
      await pool.close();
    }
  });

  it('spreads the jobs over its threads by the work queued (the vectors are transferred, so their size is counted before sending)', async () => {
    const pool = new IndexBuildPool(2);
    try {
      const sizes = [1200, 1000, 300, 200];
      const built = sizes.map((n, i) => pool.build(randomVectors(n, 6, i + 1), 6, params, join(dir, `spread-${i}.bin`)));
      // largest first, each to the least loaded thread: 1200 | 1000, then 300 to the 1000, 200 to the 1200
      expect(pool.queuedValues()).toEqual([(1200 + 200) * 6, (1000 + 300) * 6]);
      await Promise.all(built);
      expect(pool.queuedValues()).toEqual([0, 0]);
    } finally {
      await pool.close();
    }
  });

  it('turns a build that fails in a worker into a Kindred error, and keeps working for the next job', async () => {
    const pool = new IndexBuildPool(2);
    try {
      const bad = randomVectors(10, 4, 3);
      bad[5] = Number.NaN; // refused by GuardedIndex before it reaches the native addon
      const failed = pool.build(bad, 4, params, join(dir, 'bad.bin'));
      await expect(failed).rejects.toBeInstanceOf(KindredError);
      await expect(failed).rejects.toThrow(/worker thread/);
      const ok = await pool.build(randomVectors(50, 4, 4), 4, params, join(dir, 'ok.bin'));
      expect(ok.byteLength).toBeGreaterThan(0);
    } finally {
      await pool.close();
    }
  });
});

describe('buildStore with worker threads', () => {
  it('writes the same store (every file checksum) as a build in one thread', async () => {
    const league = simulateLeague({ seed: 77, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: 10000 });
    await writeLeagueCsv(league, join(dir, 'roster'));
    await buildStore(join(dir, 'roster'), join(dir, 'one'), { lenient: false, threads: 1 });
    await buildStore(join(dir, 'roster'), join(dir, 'two'), { lenient: false, threads: 2 });
    const read = async (name: string) => manifestSchema.parse(JSON.parse(await readFile(join(dir, name, 'manifest.json'), 'utf8')));
    const one = await read('one');
    const two = await read('two');
    expect(Object.keys(one.files).filter((f) => f.endsWith('.hnsw')).length).toBeGreaterThan(0);
    expect(two.files).toEqual(one.files);
    expect(two.params).toEqual(one.params);
  }, 120_000);
});
