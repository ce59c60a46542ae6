/**
 * Child process for tests/store/corruptIndex.test.ts
 * (run as `node --import tsx corruptIndexChild.ts <work folder> [body|entry-point|max-elements]`).
 * Builds a store holding an HNSW index and damages the index file: `body` overwrites part of the
 * index body with the same number of bytes; `entry-point` names an element without upper layers as
 * the entry point, `max-elements` sets the capacity one below the count; these two rewrite the file's
 * size and sha256 in the manifest, so that the checksum check passes. Then it opens the store and tries to load the index as the serving code would. It prints
 * one line per attempt (`store <code>`, then `direct <code>` for a load that skips the store) and
 * ends normally; a crash in the native code would instead end it by a signal.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { sha256Hex } from '../../src/store/sha256Hex.ts';
import { join } from 'node:path';
import { KindredError } from '../../src/errors/KindredError.ts';
import { GuardedIndex } from '../../src/ann/GuardedIndex.ts';
import type { IndexMeta } from '../../src/ann/IndexParams.ts';
import { openStore } from '../../src/store/openStore.ts';
import { writeStore } from '../../src/store/writeStore.ts';
import { randomVectors } from '../ann/randomVectors.ts';

const work = process.argv[2] ?? '.';
const mode = process.argv[3] ?? 'body';
const dim = 8;
const rows = randomVectors(2000, dim, 7);
const built = GuardedIndex.build(rows, dim, { M: 16, efConstruction: 100, ef: 64, seed: 3 });
built.save(join(work, 'built.hnsw'));
const storeDir = join(work, 'store');
await writeStore(storeDir, { params: { index: { ...built.meta } }, files: new Map([['index.hnsw', readFileSync(join(work, 'built.hnsw'))]]) });

const indexPath = join(storeDir, 'index.hnsw');
const bytes = readFileSync(indexPath);
if (mode === 'entry-point' || mode === 'max-elements') {
  // hnswlib 0.8 layout (hnswalg.h): entry point uint32 at byte 52; after layer 0 (count x
  // sizeDataPerElement bytes from byte 96), each element's uint32 size of its upper-layer lists.
  const count = Number(bytes.readBigUInt64LE(16));
  let at = 96 + count * Number(bytes.readBigUInt64LE(24));
  let low = -1;
  for (let i = 0; i < count && low < 0; i++) {
    const size = bytes.readUInt32LE(at);
    if (size === 0) low = i;
    at += 4 + size;
  }
  if (mode === 'entry-point') bytes.writeUInt32LE(low, 52);
  else bytes.writeBigUInt64LE(BigInt(count - 1), 8); // maxElements, at byte 8
  writeFileSync(indexPath, bytes);
  const manifestPath = join(storeDir, 'manifest.json');
  const manifest: { files: Record<string, { sha256: string; bytes: number }> } = JSON.parse(readFileSync(manifestPath, 'utf8'));
  manifest.files['index.hnsw'] = { sha256: sha256Hex(bytes), bytes: bytes.length };
  writeFileSync(manifestPath, JSON.stringify(manifest));
} else {
  // Same length, new body: every byte of the first half of layer 0 set to 0xff (links, counts, labels).
  bytes.fill(0xff, 96, 96 + Math.floor((bytes.length - 96) / 2));
  writeFileSync(indexPath, bytes);
}

function attempt(label: string, run: () => Promise<void>): Promise<void> {
  return run().then(
    () => console.log(`${label} loaded`),
    (error: unknown) => console.log(`${label} ${error instanceof KindredError ? error.code : `unexpected ${String(error)}`}`),
  );
}

function metaOf(params: Record<string, unknown>): IndexMeta {
  const index = params['index'];
  const take = (key: string): number => {
    const value = typeof index === 'object' && index !== null ? new Map<string, unknown>(Object.entries(index)).get(key) : undefined;
    if (typeof value !== 'number') throw new Error(`manifest params.index.${key} is missing`);
    return value;
  };
  return { dim: take('dim'), count: take('count'), M: take('M'), efConstruction: take('efConstruction'), ef: take('ef') };
}

await attempt('store', async () => {
  const store = await openStore(storeDir);
  const index = GuardedIndex.load(store.path('index.hnsw'), metaOf(store.manifest.params));
  index.search(Array.from(rows.subarray(0, dim)), 10);
});
await attempt('direct', async () => {
  const index = GuardedIndex.load(indexPath, built.meta);
  index.search(Array.from(rows.subarray(0, dim)), 10);
});
