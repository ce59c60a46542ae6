import { StoreError } from '../errors/KindredError.ts';
import type { IndexMeta } from './IndexParams.ts';

/** Byte size of the header hnswlib 0.8 writes before the layer-0 block (12 fields, packed, little-endian). */
export const HNSW_HEADER_BYTES = 96;

/**
 * Structural check of a file written by hnswlib's `saveIndex` (hnswalg.h, hnswlib 0.8, vendored by
 * hnswlib-node 3.0.0), done in JS before the native reader sees it. It compares the header with the
 * manifest (count, capacity equal to the count, M, 2M, efConstruction, the per-element size implied by dim), then walks every
 * layer-0 and upper-layer link list checking neighbour counts and ids (< count), labels (< count),
 * that a neighbour on level L reaches level L itself, that the entry point sits on the top level, and
 * that the lists end exactly at the end of the file: the invariants the native reader and search trust.
 *
 * This is a second line of defence: the store's sha256 check is the first. It does not look at the
 * vector values (a flipped float only changes distances, it cannot send the native code astray).
 *
 * Layout (from saveIndex): offsetLevel0, maxElements, count, sizeDataPerElement, labelOffset,
 * offsetData (size_t each), maxLevel (int32), entryPoint (uint32), maxM, maxM0, M (size_t),
 * mult (double), efConstruction (size_t); then count * sizeDataPerElement bytes of layer 0
 * (uint32 list size [low 16 bits used], maxM0 uint32 ids, dim float32, uint64 label); then per element
 * a uint32 byte size followed by level * (4 + 4 * maxM) bytes of upper-layer lists.
 */
export function verifyHnswFile(bytes: Uint8Array, meta: IndexMeta, file: string): void {
  const fail = (what: string): never => {
    throw new StoreError('kindred.store.corrupt', `${file}: index file is not the one the manifest describes: ${what}`, {
      file,
    });
  };
  if (bytes.length < HNSW_HEADER_BYTES) fail(`${bytes.length} bytes, shorter than the ${HNSW_HEADER_BYTES}-byte header`);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const u64 = (at: number): number => Number(view.getBigUint64(at, true));
  const offsetLevel0 = u64(0);
  const maxElements = u64(8);
  const count = u64(16);
  const sizeData = u64(24);
  const labelOffset = u64(32);
  const offsetData = u64(40);
  const maxLevel = view.getInt32(48, true);
  const entryPoint = view.getUint32(52, true);
  const maxM = u64(56);
  const maxM0 = u64(64);
  const m = u64(72);
  const efConstruction = u64(88);

  const linksLevel0 = maxM0 * 4 + 4;
  const expect = (name: string, found: number, wanted: number): void => {
    if (found !== wanted) fail(`${name} is ${found} (expected ${wanted})`);
  };
  expect('offsetLevel0', offsetLevel0, 0);
  expect('maxM0', maxM0, 2 * meta.M);
  if (sizeData !== linksLevel0 + 4 * meta.dim + 8) {
    fail(`${sizeData} bytes per element imply dimension ${(sizeData - linksLevel0 - 8) / 4} (expected ${meta.dim})`);
  }
  expect('element count', count, meta.count);
  // The native reader allocates maxElements elements and then reads count of them into that block:
  // a smaller maxElements overruns the heap (the process aborts), a huge one asks for any amount of
  // memory. GuardedIndex.build sizes it to the count (at least 1).
  expect('maxElements', maxElements, Math.max(count, 1));
  expect('M', m, meta.M);
  expect('maxM', maxM, meta.M);
  expect('efConstruction', efConstruction, meta.efConstruction);
  expect('offsetData', offsetData, linksLevel0);
  expect('labelOffset', labelOffset, linksLevel0 + 4 * meta.dim);
  if (count > 0 && entryPoint >= count) fail(`entry point ${entryPoint} is not below the count ${count}`);
  const lowestTop = count > 0 ? 0 : -1;
  if (maxLevel < lowestTop || maxLevel > 64) fail(`top level ${maxLevel} (expected ${lowestTop} to 64)`);

  const level0End = HNSW_HEADER_BYTES + count * sizeData;
  if (level0End > bytes.length) fail(`layer 0 needs ${level0End} bytes, the file has ${bytes.length}`);
  for (let i = 0; i < count; i++) {
    const base = HNSW_HEADER_BYTES + i * sizeData;
    const links = view.getUint16(base, true);
    if (links > maxM0) fail(`element ${i} has ${links} layer-0 links (at most ${maxM0})`);
    for (let l = 0; l < links; l++) {
      const id = view.getUint32(base + 4 + 4 * l, true);
      if (id >= count) fail(`element ${i} links to ${id} (expected an id below ${count})`);
    }
    // a uint64 label, read as two uint32 halves (a BigInt per element is slow on large indexes)
    const labelLow = view.getUint32(base + labelOffset, true);
    const labelHigh = view.getUint32(base + labelOffset + 4, true);
    if (labelHigh !== 0 || labelLow >= count) fail(`element ${i} has label ${u64(base + labelOffset)} (expected a label below ${count})`);
  }
  const linksPerElement = maxM * 4 + 4;
  // First pass: each element's level (the native search trusts that a neighbour on level L has its
  // own list for level L, and that the entry point sits on the top level).
  const levelOf = new Uint8Array(count);
  const listsAt = new Float64Array(count);
  let at = level0End;
  for (let i = 0; i < count; i++) {
    if (at + 4 > bytes.length) fail(`upper-layer lists end early at element ${i}`);
    const size = view.getUint32(at, true);
    at += 4;
    if (size % linksPerElement !== 0) fail(`element ${i} has ${size} bytes of upper-layer lists (not a multiple of ${linksPerElement})`);
    const levels = size / linksPerElement;
    if (levels > maxLevel) fail(`element ${i} reaches level ${levels} above the top level ${maxLevel}`);
    if (at + size > bytes.length) fail(`element ${i} upper-layer lists run past the end of the file`);
    levelOf[i] = levels;
    listsAt[i] = at;
    at += size;
  }
  if (count > 0 && levelOf[entryPoint] !== maxLevel) {
    fail(`entry point ${entryPoint} is on level ${levelOf[entryPoint]} (expected the top level ${maxLevel})`);
  }
  for (let i = 0; i < count; i++) {
    for (let level = 0; level < (levelOf[i] as number); level++) {
      const base = (listsAt[i] as number) + level * linksPerElement;
      const links = view.getUint16(base, true);
      if (links > maxM) fail(`element ${i} has ${links} links on level ${level + 1} (at most ${maxM})`);
      for (let l = 0; l < links; l++) {
        const id = view.getUint32(base + 4 + 4 * l, true);
        if (id >= count) fail(`element ${i} links to ${id} on level ${level + 1} (expected an id below ${count})`);
        if ((levelOf[id] as number) < level + 1) fail(`element ${i} links to ${id} on level ${level + 1}, which element ${id} does not reach`);
      }
    }
  }
  if (at !== bytes.length) fail(`${bytes.length - at} bytes left after the last list`);
}
