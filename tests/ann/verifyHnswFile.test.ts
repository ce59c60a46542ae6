/**
 * The structural check of an hnswlib index file, each invariant tested on a real file written by
 * hnswlib-node with one field edited. Offsets follow hnswlib 0.8's saveIndex (hnswalg.h): a 96-byte
 * header (entry point at byte 52, top level at byte 48), then count x sizeDataPerElement bytes of
 * layer 0, then per element a uint32 byte size and level x (4 + 4M) bytes of upper-layer lists.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GuardedIndex } from '../../src/ann/GuardedIndex.ts';
import { HNSW_HEADER_BYTES, verifyHnswFile } from '../../src/ann/verifyHnswFile.ts';
import type { IndexMeta } from '../../src/ann/IndexParams.ts';
import { randomVectors } from './randomVectors.ts';

const dim = 4;
const M = 4;
let dir: string;
let file: Buffer;
let meta: IndexMeta;

/** Each element's level and the byte offset of its upper-layer lists, read from the file's layout. */
interface Layout {
  readonly count: number;
  readonly maxLevel: number;
  readonly entryPoint: number;
  readonly levels: number[];
  readonly listsAt: number[];
  readonly linksPerList: number;
}

function layoutOf(bytes: Buffer): Layout {
  const count = Number(bytes.readBigUInt64LE(16));
  const sizeData = Number(bytes.readBigUInt64LE(24));
  const maxLevel = bytes.readInt32LE(48);
  const entryPoint = bytes.readUInt32LE(52);
  const maxM = Number(bytes.readBigUInt64LE(56));
  const linksPerList = 4 + 4 * maxM;
  const levels: number[] = [];
  const listsAt: number[] = [];
  let at = HNSW_HEADER_BYTES + count * sizeData;
  for (let i = 0; i < count; i++) {
    const size = bytes.readUInt32LE(at);
    levels.push(size / linksPerList);
    listsAt.push(at + 4);
    at += 4 + size;
  }
  return { count, maxLevel, entryPoint, levels, listsAt, linksPerList };
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'kindred-hnsw-'));
  const index = GuardedIndex.build(randomVectors(600, dim, 11), dim, { M, efConstruction: 50, ef: 20, seed: 5 });
  index.save(join(dir, 'index.hnsw'));
  file = readFileSync(join(dir, 'index.hnsw'));
  meta = index.meta;
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const edited = (edit: (bytes: Buffer, layout: Layout) => void): Buffer => {
  const copy = Buffer.from(file);
  edit(copy, layoutOf(copy));
  return copy;
};

describe('verifyHnswFile', () => {
  it('accepts the file as hnswlib wrote it, whose graph has several levels', () => {
    const layout = layoutOf(file);
    expect(layout.maxLevel).toBeGreaterThanOrEqual(2);
    expect(layout.levels[layout.entryPoint]).toBe(layout.maxLevel);
    expect(() => verifyHnswFile(file, meta, 'index.hnsw')).not.toThrow();
  });

  it('refuses an entry point below the count that sits under the top level (the native search would read past its lists)', () => {
    const bytes = edited((b, l) => {
      const low = l.levels.findIndex((level) => level === 0);
      expect(low).toBeGreaterThanOrEqual(0);
      b.writeUInt32LE(low, 52);
    });
    expect(() => verifyHnswFile(bytes, meta, 'index.hnsw')).toThrow(/entry point \d+ is on level 0 \(expected the top level \d+\)/);
  });

  it('refuses a top level raised above every element (the entry point is then under it)', () => {
    const bytes = edited((b, l) => b.writeInt32LE(l.maxLevel + 1, 48));
    expect(() => verifyHnswFile(bytes, meta, 'index.hnsw')).toThrow(/entry point \d+ is on level \d+ \(expected the top level \d+\)/);
  });

  it('refuses a level-1 link to an element that has no level-1 list', () => {
    const bytes = edited((b, l) => {
      const from = l.levels.findIndex((level, i) => level >= 1 && b.readUInt16LE(l.listsAt[i] as number) > 0);
      const to = l.levels.findIndex((level) => level === 0);
      expect(from).toBeGreaterThanOrEqual(0);
      // first neighbour id of `from`'s level-1 list (after the list's 4-byte size)
      b.writeUInt32LE(to, (l.listsAt[from] as number) + 4);
    });
    expect(() => verifyHnswFile(bytes, meta, 'index.hnsw')).toThrow(/links to \d+ on level 1, which element \d+ does not reach/);
  });

  it('refuses an upper-layer neighbour id at or past the count', () => {
    const bytes = edited((b, l) => {
      const from = l.levels.findIndex((level, i) => level >= 1 && b.readUInt16LE(l.listsAt[i] as number) > 0);
      b.writeUInt32LE(l.count, (l.listsAt[from] as number) + 4);
    });
    expect(() => verifyHnswFile(bytes, meta, 'index.hnsw')).toThrow(/links to \d+ on level 1 \(expected an id below \d+\)/);
  });

  it('refuses a capacity (maxElements) below the count: the native reader would read count elements into a smaller block', () => {
    const bytes = edited((b, l) => b.writeBigUInt64LE(BigInt(l.count - 1), 8));
    expect(() => verifyHnswFile(bytes, meta, 'index.hnsw')).toThrow(/maxElements is \d+ \(expected \d+\)/);
  });

  it('refuses a capacity far above the count (the native reader would allocate it whole)', () => {
    const bytes = edited((b) => b.writeBigUInt64LE(2n ** 40n, 8));
    expect(() => verifyHnswFile(bytes, meta, 'index.hnsw')).toThrow(/maxElements is 1099511627776 \(expected 600\)/);
  });

  it('refuses an upper-layer list claiming more than M links', () => {
    const bytes = edited((b, l) => {
      const from = l.levels.findIndex((level) => level >= 1);
      b.writeUInt16LE(M + 1, l.listsAt[from] as number);
    });
    expect(() => verifyHnswFile(bytes, meta, 'index.hnsw')).toThrow(new RegExp(`has ${M + 1} links on level 1 \\(at most ${M}\\)`));
  });
});
