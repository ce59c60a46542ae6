import { randomBytes } from 'node:crypto';
import { readFileSync, renameSync, rmSync, statSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import hnswlib from 'hnswlib-node';
import { IndexError, StoreError, UsageError } from '../errors/KindredError.ts';
import { checkRows, checkVector } from './checkVector.ts';
import { checkK, exactSearch } from './exactSearch.ts';
import type { IndexHits, IndexMeta, IndexParams, LabelFilter } from './IndexParams.ts';
import { verifyHnswFile } from './verifyHnswFile.ts';
import { withCause } from '../errors/withCause.ts';

const { HierarchicalNSW } = hnswlib;
type Native = InstanceType<typeof HierarchicalNSW>;

/** Labels are coerced to unsigned 32-bit by hnswlib-node, so no more rows than that. */
export const MAX_INDEX_ROWS = 2 ** 32 - 1;

/**
 * An HNSW index (Malkov & Yashunin 2016, arXiv:1603.09320) over hnswlib-node's HierarchicalNSW in the
 * `l2` space (squared Euclidean distance), with every native call guarded:
 * vectors are checked (length, finite float32) before they reach the addon, a throwing filter is caught
 * inside the callback (an exception there would abort the process), native exceptions become
 * IndexError `kindred.index.native`, ef is re-applied after each load (it is not saved in the file)
 * and raised to k for a query when smaller.
 *
 * Objects are made only by `build` and `load`, so each one holds a ready native index.
 * Search and save are synchronous, so they can never overlap on the same native object.
 *
 * @example
 * const index = GuardedIndex.build(new Float32Array([0, 0, 1, 0, 3, 4]), 2, { M: 16, efConstruction: 200, ef: 64, seed: 1 });
 * index.search([0, 0], 2); // => { labels: [0, 1], distances: [0, 1] }
 */
export class GuardedIndex {
  readonly dim: number;
  readonly count: number;
  readonly M: number;
  readonly efConstruction: number;
  readonly ef: number;
  readonly #native: Native;

  private constructor(native: Native, meta: IndexMeta) {
    this.#native = native;
    this.dim = meta.dim;
    this.count = meta.count;
    this.M = meta.M;
    this.efConstruction = meta.efConstruction;
    this.ef = meta.ef;
  }

  /**
   * Builds an index of the rows of `vectors` (row-major, `dim` wide); label i is row i, inserted in
   * label order so that the same data, parameters and seed give a byte-identical file.
   */
  static build(vectors: Float32Array, dim: number, params: IndexParams): GuardedIndex {
    const count = checkRows(vectors, dim);
    if (count > MAX_INDEX_ROWS) {
      throw new IndexError('kindred.index.badLabel', `${count} rows (expected at most ${MAX_INDEX_ROWS})`, { count });
    }
    checkParams(params);
    const meta: IndexMeta = { dim, count, M: params.M, efConstruction: params.efConstruction, ef: params.ef };
    const native = guardNative('build', () => {
      const index = new HierarchicalNSW('l2', dim);
      index.initIndex({
        maxElements: Math.max(count, 1),
        m: params.M,
        efConstruction: params.efConstruction,
        randomSeed: params.seed,
      });
      const row = new Array<number>(dim);
      for (let i = 0; i < count; i++) {
        for (let j = 0; j < dim; j++) row[j] = vectors[i * dim + j] ?? 0;
        index.addPoint(row, i);
      }
      index.setEf(params.ef);
      return index;
    });
    return new GuardedIndex(native, meta);
  }

  /**
   * Loads an index saved by `save`, into a fresh native object (a failed read on a used object leaves
   * it pointing at freed memory), then sets ef from `meta` (the file does not keep it).
   *
   * Contract: call this only on a file whose checksum has been verified, as `openStore` does for every
   * file it lists. A body corrupted at the same length can load and then crash the process at search.
   * As a second guard the file's structure is checked against `meta` in JS before the native reader
   * runs; after loading, the count and dimension are compared too. Any mismatch discards the native
   * object and throws StoreError `kindred.store.corrupt`. `verified`, when given, is the file's
   * content as the caller read and verified it (then it is checked here instead of being read again).
   */
  static load(path: string, meta: IndexMeta, verified?: Uint8Array): GuardedIndex {
    checkMeta(meta);
    let bytes: Uint8Array;
    try {
      bytes = verified ?? readFileSync(path);
    } catch (error) {
      throw withCause(
        new StoreError('kindred.store.corrupt', `${path}: cannot read the index file (${describe(error)})`, { file: path }),
        error,
      );
    }
    verifyHnswFile(bytes, meta, path);
    const native = new HierarchicalNSW('l2', meta.dim);
    try {
      native.readIndexSync(path);
    } catch (error) {
      throw withCause(
        new StoreError('kindred.store.corrupt', `${path}: the native reader refused the index (${describe(error)})`, {
          file: path,
        }),
        error,
      );
    }
    const count = native.getCurrentCount();
    const dim = native.getNumDimensions();
    if (count !== meta.count || dim !== meta.dim) {
      throw new StoreError(
        'kindred.store.corrupt',
        `${path}: index holds ${count} rows of ${dim} (expected ${meta.count} rows of ${meta.dim} from the manifest)`,
        { file: path, count, dim },
      );
    }
    native.setEf(meta.ef);
    return new GuardedIndex(native, meta);
  }

  /** Brute-force reference search (squared L2), the same as {@link exactSearch}. */
  static exactSearch(
    vectors: Float32Array,
    dim: number,
    query: ArrayLike<number>,
    k: number,
    filter?: LabelFilter,
  ): IndexHits {
    return exactSearch(vectors, dim, query, k, filter);
  }

  /** The parameters a manifest must keep to load this index again. */
  get meta(): IndexMeta {
    return { dim: this.dim, count: this.count, M: this.M, efConstruction: this.efConstruction, ef: this.ef };
  }

  /** The ef the native object is set to now (equal to `ef` between searches). */
  get nativeEf(): number {
    return this.#native.getEf();
  }

  /**
   * The k nearest rows to `query` (closest first, squared L2). k is clamped to the row count.
   * A filter that throws is caught inside the native callback (the rest of the search sees `false`)
   * and its error is thrown after the search as IndexError with the original as `cause`.
   */
  search(query: ArrayLike<number>, k: number, filter?: LabelFilter): IndexHits {
    checkVector(query, this.dim, 'query');
    checkK(k);
    const want = Math.min(k, this.count);
    if (want === 0) return { labels: [], distances: [] };
    const point = Array.from(query);
    let thrown: { error: unknown } | undefined;
    const guarded =
      filter &&
      ((label: number): boolean => {
        if (thrown) return false;
        try {
          return filter(label) === true;
        } catch (error) {
          thrown = { error };
          return false;
        }
      });
    const raised = want > this.ef;
    const result = guardNative('search', () => {
      if (raised) this.#native.setEf(want);
      try {
        return guarded ? this.#native.searchKnn(point, want, guarded) : this.#native.searchKnn(point, want);
      } finally {
        if (raised) this.#native.setEf(this.ef);
      }
    });
    if (thrown) {
      throw withCause(
        new IndexError('kindred.index.native', `the search filter threw: ${describe(thrown.error)}`, { stage: 'filter' }),
        thrown.error,
      );
    }
    return { labels: Array.from(result.neighbors), distances: Array.from(result.distances) };
  }

  /**
   * Saves the index to `path`: writes a temp file in the same folder (the native writer does no error
   * checking, even for a missing folder or a full disk), checks it is non-empty and structurally sound,
   * then renames it over `path`. Throws StoreError `kindred.store.writeFailed` and leaves `path` as it was.
   */
  save(path: string): void {
    const temp = join(dirname(path), `.${basename(path)}.tmp-${process.pid}-${randomBytes(4).toString('hex')}`);
    try {
      guardNative('save', () => this.#native.writeIndexSync(temp));
      const size = statSync(temp).size;
      if (size <= 0) throw new Error(`the written file is empty`);
      verifyHnswFile(readFileSync(temp), this.meta, temp);
      renameSync(temp, path);
    } catch (error) {
      rmSync(temp, { force: true });
      throw withCause(
        new StoreError('kindred.store.writeFailed', `${path}: cannot save the index (${describe(error)})`, { file: path }),
        error,
      );
    }
  }
}

function guardNative<T>(stage: string, call: () => T): T {
  try {
    return call();
  } catch (error) {
    if (error instanceof IndexError || error instanceof StoreError) throw error;
    throw withCause(new IndexError('kindred.index.native', `native index ${stage} failed: ${describe(error)}`, { stage }), error);
  }
}

function describe(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

function checkInteger(name: string, value: number, min: number): void {
  if (!Number.isInteger(value) || value < min) {
    throw new UsageError(`${name} is ${value} (expected an integer >= ${min})`, { [name]: value });
  }
}

function checkParams(params: IndexParams): void {
  checkInteger('M', params.M, 2);
  checkInteger('efConstruction', params.efConstruction, 1);
  checkInteger('ef', params.ef, 1);
  checkInteger('seed', params.seed, 0);
}

function checkMeta(meta: IndexMeta): void {
  checkInteger('dim', meta.dim, 1);
  checkInteger('count', meta.count, 0);
  checkInteger('M', meta.M, 2);
  checkInteger('efConstruction', meta.efConstruction, 1);
  checkInteger('ef', meta.ef, 1);
}
