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
  const target = resolve(dir);
  const fail = (what: string, cause?: unknown): StoreError =>
    withCause(new StoreError('kindred.store.writeFailed', `cannot write the store at ${target}: ${what}`, { dir: target }), cause);

  for (const name of input.files.keys()) {
    const problem = fileNameProblem(name);
    if (problem) throw fail(`file name ${JSON.stringify(name)} ${problem} (expected a flat file name)`);
  }
  let params: Record<string, unknown>;
  try {
    params = manifestSchema.shape.params.parse(JSON.parse(JSON.stringify(input.params)));
  } catch (error) {
    throw fail(`params are not JSON-serialisable (${describe(error)})`, error);
  }
  try {
    await checkStoreTarget(target);
  } catch (error) {
    if (error instanceof StoreError) throw error;
    throw fail(describe(error), error);
  }

  const suffix = `${process.pid}-${randomBytes(4).toString('hex')}`;
  const temp = `${target}.tmp-${suffix}`;
  try {
    await mkdir(temp);
    const files: Record<string, FileEntry> = {};
    for (const name of [...input.files.keys()].sort()) {
      const content = input.files.get(name) ?? '';
      const bytes = typeof content === 'string' ? Buffer.from(content, 'utf8') : content;
      await writeFlushed(join(temp, name), bytes);
      files[name] = { sha256: sha256Hex(bytes), bytes: bytes.byteLength };
    }
    const manifest: Manifest = {
      format: STORE_FORMAT,
      version: STORE_FORMAT_VERSION,
      createdAt: new Date().toISOString(),
      params,
      files,
    };
    await writeFlushed(join(temp, MANIFEST_NAME), Buffer.from(`${JSON.stringify(manifest, null, 2)}\n`, 'utf8'));
    await swapIn(temp, target, `${target}.old-${suffix}`);
    return manifest;
  } catch (error) {
    await rm(temp, { recursive: true, force: true });
    if (error instanceof KindredError) throw error;
    throw fail(describe(error), error);
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

