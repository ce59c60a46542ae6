import { constants } from 'node:fs';
import { access, lstat, open, readdir, readFile, realpath, rename, rm, stat, unlink } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { StoreError } from '../errors/KindredError.ts';
import { withCause } from '../errors/withCause.ts';
import { MANIFEST_NAME, STORE_FORMAT } from './manifest.ts';
import { BACKTEST_FILE } from './storeFileNames.ts';

const writeFailed = (target: string, what: string, cause?: unknown): StoreError =>
  withCause(new StoreError('kindred.store.writeFailed', `cannot write the store at ${target}: ${what}`, { dir: target }), cause);

const describe = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/**
 * Checks, before any work, that a store can be written at `dir`: the parent folder exists, is a folder
 * and is writable; `dir` is not a symbolic link (it is refused, not followed: the message names the
 * link's target to build there instead); and `dir` is absent, an empty folder, or a Kindred store
 * (its manifest parses with Kindred's format tag, of any version) holding only the files its manifest
 * lists. Anything else would be deleted by the swap, so it is refused with StoreError
 * `kindred.store.writeFailed` naming what is in the way. Returns the absolute path.
 */
export async function checkStoreTarget(dir: string): Promise<string> {
  const target = resolve(dir);
  const parent = dirname(target);
  try {
    if (!(await stat(parent)).isDirectory()) throw writeFailed(target, `the parent ${parent} is not a folder`);
    await access(parent, constants.W_OK);
  } catch (error) {
    if (error instanceof StoreError) throw error;
    throw writeFailed(target, `the parent folder ${parent} is missing or not writable (${describe(error)})`, error);
  }
  let link;
  try {
    link = await lstat(target);
  } catch {
    return target; // nothing there yet
  }
  if (link.isSymbolicLink()) {
    const to = await realpath(target).catch(() => '(a missing target)');
    throw writeFailed(target, `it is a symbolic link to ${to}; Kindred does not replace or follow links (give the target folder itself to build there)`);
  }
  if (!link.isDirectory()) throw writeFailed(target, 'a file of that name exists (expected a store folder or nothing)');
  const entries = await readdir(target);
  if (entries.length === 0) return target;
  const listed = await storeFilesOf(target);
  if (!listed) {
    throw writeFailed(target, `the folder holds ${entries.length} ${entries.length === 1 ? 'entry' : 'entries'} but no ${MANIFEST_NAME} of a Kindred store (expected a store folder or an empty one)`);
  }
  const foreign = entries.filter((e) => e !== MANIFEST_NAME && e !== BACKTEST_FILE && !listed.has(e));
  if (foreign.length > 0) {
    const shown = foreign.slice(0, 5).join(', ') + (foreign.length > 5 ? `, and ${foreign.length - 5} more` : '');
    throw writeFailed(target, `the store folder holds entries Kindred did not write (${shown}); move them away first`);
  }
  return target;
}

/** The files a folder's manifest lists when it parses as a Kindred store manifest (any version), else null. */
async function storeFilesOf(folder: string): Promise<Set<string> | null> {
  let value: unknown;
  try {
    value = JSON.parse(await readFile(join(folder, MANIFEST_NAME), 'utf8'));
  } catch {
    return null;
  }
  if (typeof value !== 'object' || value === null) return null;
  const head = new Map<string, unknown>(Object.entries(value));
  const files = head.get('files');
  if (head.get('format') !== STORE_FORMAT || typeof files !== 'object' || files === null) return null;
  return new Set(Object.keys(files));
}

/** A held build lock; `release` removes it. */
export interface StoreLock {
  release(): Promise<void>;
}

/** The lock file beside a store: `<store>.lock`, holding the builder's pid. */
export const lockFileOf = (dir: string): string => `${resolve(dir)}.lock`;

/**
 * Takes the build lock of the store at `dir` (`<store>.lock`, created exclusively, holding this
 * process's pid). A lock whose holder is no longer running is stale: it is removed and taken. A lock
 * held by a running process is StoreError `kindred.store.locked` naming the pid.
 */
export async function lockStore(dir: string): Promise<StoreLock> {
  const target = resolve(dir);
  const path = lockFileOf(target);
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const handle = await open(path, 'wx');
      try {
        await handle.writeFile(`${process.pid}\n`);
      } finally {
        await handle.close();
      }
      return { release: () => unlink(path).catch(() => undefined) };
    } catch (error) {
      if (!isCode(error, 'EEXIST')) throw writeFailed(target, `cannot create the lock ${path} (${describe(error)})`, error);
    }
    const holder = Number.parseInt(await readFile(path, 'utf8').catch(() => ''), 10);
    if (Number.isInteger(holder) && holder > 0 && isRunning(holder)) {
      throw new StoreError('kindred.store.locked', `another build (pid ${holder}) is writing the store at ${target}; wait for it to finish (or remove ${path} if that process is not a build)`, {
        dir: target,
        pid: holder,
      });
    }
    await unlink(path).catch(() => undefined); // stale: its holder is gone
  }
  throw writeFailed(target, `cannot take the lock ${path}`);
}

/**
 * Removes what killed builds of the store at `dir` left beside it: `<store>.tmp-<pid>-<hex>` and
 * `<store>.old-<pid>-<hex>` folders (and the same for `<store>.charts`) whose pid is not running.
 * When the store itself is missing and a backup holds a Kindred store (a build killed between its two
 * renames), the backup is put back first. Call it with the build lock held. Returns the names removed.
 */
export async function cleanLeftovers(dir: string): Promise<string[]> {
  const target = resolve(dir);
  const parent = dirname(target);
  const pattern = new RegExp(`^${escape(basename(target))}(\\.charts)?\\.(tmp|old)-(\\d+)-[0-9a-f]{8}$`);
  const names = await readdir(parent).catch(() => []);
  const stale = names.filter((n) => {
    const m = pattern.exec(n);
    return m !== null && !isRunning(Number(m[3]));
  });
  const exists = await lstat(target).then(() => true, () => false);
  if (!exists) {
    const backup = stale.find((n) => /\.old-/.test(n) && !n.includes('.charts.'));
    if (backup && (await storeFilesOf(join(parent, backup)))) {
      await rename(join(parent, backup), target);
      stale.splice(stale.indexOf(backup), 1);
    }
  }
  for (const n of stale) await rm(join(parent, n), { recursive: true, force: true });
  return stale;
}

function escape(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

function isRunning(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return isCode(error, 'EPERM');
  }
}

function isCode(error: unknown, code: string): boolean {
  return error instanceof Error && 'code' in error && error.code === code;
}
