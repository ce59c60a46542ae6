import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { IndexError, StoreError } from '../../src/errors/KindredError.ts';
import { exactSearch } from '../../src/ann/exactSearch.ts';
import { GuardedIndex } from '../../src/ann/GuardedIndex.ts';
import type { IndexParams } from '../../src/ann/IndexParams.ts';
import { meanRecall, randomVectors, row } from './randomVectors.ts';

// Invented data: 20,000 rows of 24 uniform values; recall is measured against brute force (the reference).
const DIM = 24;
const COUNT = 20_000;
const K = 10;
const QUERIES = 200;
const PARAMS: IndexParams = { M: 16, efConstruction: 200, ef: 128, seed: 42 };

let vectors: Float32Array;
let queries: number[][];
let truth: number[][];
let index: GuardedIndex;
let dir: string;

function recallOf(candidate: GuardedIndex): number {
  return meanRecall(truth, queries.map((q) => candidate.search(q, K).labels));
}

beforeAll(() => {
  vectors = randomVectors(COUNT, DIM, 1);
  const queryRows = randomVectors(QUERIES, DIM, 2);
  queries = Array.from({ length: QUERIES }, (_, i) => row(queryRows, DIM, i));
  truth = queries.map((q) => exactSearch(vectors, DIM, q, K).labels);
  index = GuardedIndex.build(vectors, DIM, PARAMS);
  dir = mkdtempSync(join(tmpdir(), 'kindred-index-'));
});

afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

describe('GuardedIndex.build(vectors, dim, params) then search(query, k)', () => {
  it('finds >= 99% of the exact top-10 with ef 128 on 20,000 x 24 random rows', () => {
    expect(recallOf(index)).toBeGreaterThanOrEqual(0.99);
  });

  it('returns squared L2 distances, closest first, matching the exact distances of the same labels', () => {
    const q = queries[0] ?? [];
    const hits = index.search(q, K);
    expect(hits.labels).toHaveLength(K);
    for (let n = 1; n < hits.distances.length; n++) {
      expect(hits.distances[n] ?? NaN).toBeGreaterThanOrEqual(hits.distances[n - 1] ?? NaN);
    }
    hits.labels.forEach((label, n) => {
      const own = exactSearch(vectors.subarray(label * DIM, (label + 1) * DIM), DIM, q, 1).distances[0] ?? NaN;
      expect(hits.distances[n]).toBeCloseTo(own, 4);
    });
  });

  it('finds a stored row itself at distance 0', () => {
    const hits = index.search(row(vectors, DIM, 1234), 1);
    expect(hits).toEqual({ labels: [1234], distances: [0] });
  });

  it('returns plain arrays', () => {
    const hits = index.search(new Float32Array(DIM), 3);
    expect(Array.isArray(hits.labels) && Array.isArray(hits.distances)).toBe(true);
  });

  it('clamps k to the row count and raises ef to k for that query only', () => {
    const small = GuardedIndex.build(randomVectors(50, 4, 5), 4, { ...PARAMS, ef: 5 });
    const hits = small.search([0.5, 0.5, 0.5, 0.5], 80);
    expect(new Set(hits.labels).size).toBe(50);
    expect(small.nativeEf).toBe(5);
  });

  it('keeps only labels the filter accepts', () => {
    const hits = index.search(queries[1] ?? [], K, (label) => label % 10 === 3);
    expect(hits.labels).toHaveLength(K);
    expect(hits.labels.every((label) => label % 10 === 3)).toBe(true);
    const exact = exactSearch(vectors, DIM, queries[1] ?? [], K, (label) => label % 10 === 3);
    expect(meanRecall([exact.labels], [hits.labels])).toBeGreaterThanOrEqual(0.9);
  });

  it('builds byte-identical files from the same rows, parameters and seed', () => {
    const rows = randomVectors(2000, 8, 9);
    GuardedIndex.build(rows, 8, PARAMS).save(join(dir, 'a.hnsw'));
    GuardedIndex.build(rows, 8, PARAMS).save(join(dir, 'b.hnsw'));
    expect(readFileSync(join(dir, 'a.hnsw')).equals(readFileSync(join(dir, 'b.hnsw')))).toBe(true);
  });
});

describe('GuardedIndex refuses bad input with IndexError and the process survives', () => {
  it('refuses a NaN row at build, naming its row and dimension', () => {
    const rows = new Float32Array(12);
    rows[7] = NaN;
    expect(() => GuardedIndex.build(rows, 4, PARAMS)).toThrow(IndexError);
    expect(() => GuardedIndex.build(rows, 4, PARAMS)).toThrow('row 1, dimension 3 is NaN');
  });

  it('refuses a ragged matrix and a bad dimension', () => {
    expect(() => GuardedIndex.build(new Float32Array(10), 3, PARAMS)).toThrow(/do not split into rows of 3/);
    expect(() => GuardedIndex.build(new Float32Array(10), 0, PARAMS)).toThrow(IndexError);
  });

  it('refuses a NaN query and a wrong-length query with kindred.index.badVector', () => {
    const nan = new Array<number>(DIM).fill(0);
    nan[5] = NaN;
    expect(() => index.search(nan, K)).toThrow(expect.objectContaining({ code: 'kindred.index.badVector' }));
    expect(() => index.search([1, 2, 3], K)).toThrow(/has 3 values \(expected 24/);
    expect(index.search(queries[2] ?? [], K).labels).toHaveLength(K);
  });

  it('turns a throwing filter into IndexError with the original as cause, and keeps searching afterwards', () => {
    const boom = new Error('filter exploded');
    let error: unknown;
    try {
      index.search(queries[3] ?? [], K, (label) => {
        if (label % 2 === 0) throw boom;
        return true;
      });
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(IndexError);
    expect(error).toMatchObject({ code: 'kindred.index.native', message: expect.stringContaining('filter exploded') });
    expect(error instanceof Error ? error.cause : undefined).toBe(boom);
    expect(meanRecall([truth[3] ?? []], [index.search(queries[3] ?? [], K).labels])).toBeGreaterThanOrEqual(0.9);
  });
});

describe('GuardedIndex.save(path) and GuardedIndex.load(path, meta)', () => {
  it('round-trips: the loaded index gives identical results', () => {
    const file = join(dir, 'round.hnsw');
    index.save(file);
    const loaded = GuardedIndex.load(file, index.meta);
    expect(loaded.count).toBe(COUNT);
    for (const q of queries.slice(0, 50)) expect(loaded.search(q, K)).toEqual(index.search(q, K));
  });

  it('re-applies ef after load: ef 128 keeps recall, a load with ef 10 is measurably worse', () => {
    const file = join(dir, 'ef.hnsw');
    index.save(file);
    const loaded = GuardedIndex.load(file, index.meta);
    expect(loaded.nativeEf).toBe(128);
    const high = recallOf(loaded);
    const low = recallOf(GuardedIndex.load(file, { ...index.meta, ef: 10 }));
    expect(high).toBeGreaterThanOrEqual(0.99);
    expect(low).toBeLessThan(high);
  });

  it('refuses a manifest that disagrees with the file (dimension, count, M) with kindred.store.corrupt', () => {
    const file = join(dir, 'meta.hnsw');
    index.save(file);
    expect(() => GuardedIndex.load(file, { ...index.meta, dim: 23 })).toThrow(/imply dimension 24 \(expected 23\)/);
    expect(() => GuardedIndex.load(file, { ...index.meta, count: COUNT + 1 })).toThrow(StoreError);
    expect(() => GuardedIndex.load(file, { ...index.meta, M: 8 })).toThrow(
      expect.objectContaining({ code: 'kindred.store.corrupt' }),
    );
  });

  it('refuses a truncated file and a link pointing past the count before the native reader sees it', () => {
    const small = GuardedIndex.build(randomVectors(300, 4, 3), 4, PARAMS);
    const file = join(dir, 'small.hnsw');
    small.save(file);
    const bytes = readFileSync(file);
    writeFileSync(join(dir, 'cut.hnsw'), bytes.subarray(0, bytes.length - 7));
    expect(() => GuardedIndex.load(join(dir, 'cut.hnsw'), small.meta)).toThrow(expect.objectContaining({ code: 'kindred.store.corrupt' }));
    const bad = Buffer.from(bytes);
    bad.writeUInt32LE(0xffffffff, 96 + 4); // first layer-0 link of element 0
    writeFileSync(join(dir, 'link.hnsw'), bad);
    expect(() => GuardedIndex.load(join(dir, 'link.hnsw'), small.meta)).toThrow(/links to 4294967295/);
  });

  it('refuses a missing file with kindred.store.corrupt', () => {
    expect(() => GuardedIndex.load(join(dir, 'nothing.hnsw'), index.meta)).toThrow(/cannot read the index file/);
  });

  it('fails to save into a missing folder with kindred.store.writeFailed and leaves no temp file', () => {
    const small = GuardedIndex.build(randomVectors(20, 4, 3), 4, PARAMS);
    expect(() => small.save(join(dir, 'missing', 'x.hnsw'))).toThrow(expect.objectContaining({ code: 'kindred.store.writeFailed' }));
    const sub = mkdtempSync(join(dir, 'save-'));
    small.save(join(sub, 'x.hnsw'));
    expect(readdirSync(sub)).toEqual(['x.hnsw']);
  });
});
