import { randomBytes } from 'node:crypto';
import { mkdir, open, rename, rm } from 'node:fs/promises';
import { dirname, join, resolve } from 'node:path';
import { KindredError, StoreError } from '../errors/KindredError.ts';
import { withCause } from '../errors/withCause.ts';
import { fileNameProblem } from './checkFileName.ts';
import { type FileEntry, MANIFEST_NAME, type Manifest, manifestSchema, STORE_FORMAT, STORE_FORMAT_VERSION } from './manifest.ts';
import { sha256Hex } from './sha256Hex.ts';
import { checkStoreTarget } from './storeTarget.ts';

export interface StoreInput {
  /** Build parameters, kept in the manifest; must survive JSON (no cycles, BigInt or functions). */
  readonly params: Readonly<Record<string, unknown>>;
  /** Data files by flat name; strings are written as UTF-8. */
  readonly files: ReadonlyMap<string, Uint8Array | string>;
}

/**
 * Writes a store: every file into a sibling temp folder `<dir>.tmp-<pid>-<random>` (each flushed to
 * disk), then `manifest.json` (format tag, version, createdAt, params, sha256 and size of each file)
 * last, then swaps the folder in: an existing store is renamed to a backup, the temp folder renamed to
 * `dir`, the backup removed. Two renames in one parent folder: a reader sees the old store or the new
 * one, or (for an instant between the renames) none, never a mix.
 *
 * On any failure the temp folder is removed, an existing store is left as it was, and StoreError
 * `kindred.store.writeFailed` is thrown with the cause. Only a folder that is empty or a Kindred store
 * holding nothing but its listed files is replaced; a symbolic link is refused (checkStoreTarget).
 */
export async function writeStore(dir: string, input: StoreInput): Promise<Manifest> {
  const writer = await StoreWriter.begin(dir, [...input.files.keys()]);
  try {
    for (const name of [...input.files.keys()].sort()) await writer.add(name, input.files.get(name) ?? '');
    return await writer.commit(input.params);
  } catch (error) {
    await writer.abort();
    throw error;
  }
}

/**
 * A store written file by file, so that a build need not hold every file in memory: `begin` checks
 * the target (checkStoreTarget) and creates the sibling temp folder, `add` writes one file there
 * (flushed) and keeps only its size and sha256, `commit` writes the manifest (files listed by name)
 * and swaps the folder in as writeStore does; `abort` removes the temp folder. Failures are StoreError
 * `kindred.store.writeFailed`; an existing store is left as it was until `commit` succeeds.
 */
export class StoreWriter {
  readonly target: string;
  readonly #temp: string;
  readonly #backup: string;
  readonly #files = new Map<string, FileEntry>();

  private constructor(target: string, suffix: string) {
    this.target = target;
    this.#temp = `${target}.tmp-${suffix}`;
    this.#backup = `${target}.old-${suffix}`;
  }

  /** Checks the target and the names known in advance (more may be added), and creates the temp folder. */
  static async begin(dir: string, names: readonly string[] = []): Promise<StoreWriter> {
    const target = resolve(dir);
    const writer = new StoreWriter(target, `${process.pid}-${randomBytes(4).toString('hex')}`);
    for (const name of names) writer.#checkName(name);
    try {
      await checkStoreTarget(target);
    } catch (error) {
      if (error instanceof StoreError) throw error;
      throw writer.#fail(describe(error), error);
    }
    try {
      await mkdir(writer.#temp);
    } catch (error) {
      throw writer.#fail(describe(error), error);
    }
    return writer;
  }

  #fail(what: string, cause?: unknown): StoreError {
    return withCause(new StoreError('kindred.store.writeFailed', `cannot write the store at ${this.target}: ${what}`, { dir: this.target }), cause);
  }

  #checkName(name: string): void {
    const problem = fileNameProblem(name);
    if (problem) throw this.#fail(`file name ${JSON.stringify(name)} ${problem} (expected a flat file name)`);
  }

  /** Writes one data file (strings as UTF-8); the caller may drop `content` once this resolves. */
  async add(name: string, content: Uint8Array | string): Promise<void> {
    this.#checkName(name);
    if (this.#files.has(name)) throw this.#fail(`file ${JSON.stringify(name)} is written twice`);
    const bytes = typeof content === 'string' ? Buffer.from(content, 'utf8') : content;
    this.#files.set(name, { sha256: sha256Hex(bytes), bytes: bytes.byteLength });
    try {
      await writeFlushed(join(this.#temp, name), bytes);
    } catch (error) {
      throw this.#fail(describe(error), error);
    }
  }

  /** Writes the manifest and swaps the store in; returns the manifest. */
  async commit(inputParams: Readonly<Record<string, unknown>>): Promise<Manifest> {
    let params: Record<string, unknown>;
    try {
      params = manifestSchema.shape.params.parse(JSON.parse(JSON.stringify(inputParams)));
    } catch (error) {
      throw this.#fail(`params are not JSON-serialisable (${describe(error)})`, error);
    }
    const files: Record<string, FileEntry> = {};
    for (const name of [...this.#files.keys()].sort()) {
      const entry = this.#files.get(name);
      if (entry) files[name] = entry;
    }
    const manifest: Manifest = { format: STORE_FORMAT, version: STORE_FORMAT_VERSION, createdAt: new Date().toISOString(), params, files };
    try {
      await writeFlushed(join(this.#temp, MANIFEST_NAME), Buffer.from(`${JSON.stringify(manifest, null, 2)}\n`, 'utf8'));
      await swapIn(this.#temp, this.target, this.#backup);
    } catch (error) {
      if (error instanceof KindredError) throw error;
      throw this.#fail(describe(error), error);
    }
    return manifest;
  }

  /** Removes the temp folder (after a failure; harmless after commit). */
  async abort(): Promise<void> {
    await rm(this.#temp, { recursive: true, force: true });
  }
}

async function swapIn(temp: string, target: string, backup: string): Promise<void> {
  let hadOld = true;
  try {
    await rename(target, backup);
  } catch (error) {
    if (!isCode(error, 'ENOENT')) throw error;
    hadOld = false;
  }
  try {
    await rename(temp, target);
  } catch (error) {
    if (hadOld) await rename(backup, target);
    throw error;
  }
  await syncFolder(dirname(target));
  if (hadOld) await rm(backup, { recursive: true, force: true });
}

async function writeFlushed(path: string, bytes: Uint8Array): Promise<void> {
  const handle = await open(path, 'wx');
  try {
    await handle.writeFile(bytes);
    await handle.sync();
  } finally {
    await handle.close();
  }
}

/** Flushes a folder's entries (the renames) to disk; some file systems refuse, which is harmless. */
async function syncFolder(folder: string): Promise<void> {
  try {
    const handle = await open(folder, 'r');
    try {
      await handle.sync();
    } finally {
      await handle.close();
    }
  } catch {
    // best effort (e.g. EINVAL on file systems without folder fsync)
  }
}

function isCode(error: unknown, code: string): boolean {
  return error instanceof Error && 'code' in error && error.code === code;
}

function describe(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

