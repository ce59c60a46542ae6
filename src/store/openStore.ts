import { closeSync, fstatSync, mkdtempSync, openSync, readFileSync, readSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { StoreError } from '../errors/KindredError.ts';
import { withCause } from '../errors/withCause.ts';
import { fileNameProblem } from './checkFileName.ts';
import { type FileEntry, MANIFEST_NAME, type Manifest, manifestSchema, STORE_FORMAT, STORE_FORMAT_VERSION } from './manifest.ts';
import { sha256Hex } from './sha256Hex.ts';

/** A store whose manifest has been checked, and whose files are checked against it. */
export interface OpenStore {
  readonly dir: string;
  readonly manifest: Manifest;
  /** How the files' checksums are verified: all at open, or each when it is read. */
  readonly verify: StoreVerify;
  /** Bytes of a listed file, read and checked against the manifest (size and sha256) at each call. */
  readBytes(name: string): Promise<Uint8Array>;
  /** A listed file as UTF-8 text, checked like `readBytes`. */
  readText(name: string): Promise<string>;
  /** `readBytes` without waiting (for readers that load a part of the store on first use). */
  readBytesSync(name: string): Uint8Array;
  /** `readText` without waiting. */
  readTextSync(name: string): string;
  /**
   * Path of a listed file, for readers that take a path (the native index). With `verify: 'open'`
   * the file was verified when the store was opened; nothing else in Kindred writes into a store after that.
   */
  path(name: string): string;
  /**
   * Runs `load` on a path holding the bytes of `name` that `readBytesSync` verified (`bytes`), for
   * readers that take a path (the native index). With `verify: 'read'`, when the store folder was
   * replaced since open (a rebuild swapped a new one in), the file at the store's path is no longer
   * the one opened: the verified bytes are then written to a private temp file for the call.
   */
  withVerifiedPath<T>(name: string, bytes: Uint8Array, load: (path: string) => T): T;
  /** How many times the file has been read and verified since the store was opened. */
  reads(name: string): number;
  /** Releases the open files (`verify: 'read'`); later reads fail. Also done when the store is garbage-collected. */
  close(): void;
}

/**
 * `open`: every file's size and sha256 are checked at open (and again at each read).
 * `read`: each file is opened and its size checked at open, its sha256 checked when it is read; the
 * reads go to the files as opened, so a store folder replaced meanwhile by a rebuild is not mixed in.
 */
export type StoreVerify = 'open' | 'read';

const closeOnCollect = new FinalizationRegistry<number[]>((fds) => {
  for (const fd of fds) {
    try {
      closeSync(fd);
    } catch {
      // already closed
    }
  }
});

/**
 * Opens the store in `dir`: reads and checks `manifest.json` (format tag, version, shape), then checks
 * each listed file: with `verify: 'open'` (the default) the size and sha256 of every file before
 * anything is parsed; with `verify: 'read'` that every file is there with its size (opened and held),
 * its sha256 being checked when it is first read. Files not listed are ignored.
 *
 * Throws StoreError:
 * - `kindred.store.missing`: no folder or no manifest;
 * - `kindred.store.version`: another format or version (found and expected named);
 * - `kindred.store.corrupt`: unreadable manifest, bad shape, or a file of the wrong size or checksum
 *   (with `verify: 'read'`, a wrong checksum when the file is read).
 */
export async function openStore(dir: string, options: { readonly verify?: StoreVerify } = {}): Promise<OpenStore> {
  const verify = options.verify ?? 'open';
  const root = resolve(dir);
  const manifest = await readManifest(root);
  const entries = new Map(Object.entries(manifest.files));
  const fds = new Map<string, number>();
  const counts = new Map<string, number>();
  /** Unregisters the descriptors from closeOnCollect once closed here: their numbers may then be reused by other opens. */
  const collectToken = {};
  const closeAll = (): void => {
    closeOnCollect.unregister(collectToken);
    for (const fd of fds.values()) {
      try {
        closeSync(fd);
      } catch {
        // already closed
      }
    }
    fds.clear();
  };
  try {
    for (const [name, entry] of entries) {
      const problem = fileNameProblem(name);
      if (problem) throw corrupt(root, MANIFEST_NAME, `lists file ${JSON.stringify(name)}, which ${problem}`);
      if (verify === 'open') {
        await readVerified(root, name, entry);
        continue;
      }
      let fd: number;
      try {
        fd = openSync(join(root, name), 'r');
      } catch (error) {
        throw withCause(corrupt(root, name, `is listed in the manifest but cannot be read (${describe(error)})`), error);
      }
      fds.set(name, fd);
      const size = fstatSync(fd).size;
      if (size !== entry.bytes) throw corrupt(root, name, `has ${size} bytes (expected ${entry.bytes} from the manifest)`);
    }
  } catch (error) {
    closeAll();
    throw error;
  }
  const entryOf = (name: string): FileEntry => {
    const entry = entries.get(name);
    if (!entry) {
      throw new StoreError('kindred.store.missing', `store at ${root} lists no file ${JSON.stringify(name)}; run kindred build`, {
        dir: root,
        file: name,
      });
    }
    return entry;
  };
  const counted = (name: string, bytes: Uint8Array): Uint8Array => {
    counts.set(name, (counts.get(name) ?? 0) + 1);
    return bytes;
  };
  const readBytesSync = (name: string): Uint8Array => {
    const entry = entryOf(name);
    const fd = fds.get(name);
    if (verify === 'open') return counted(name, checkBytes(root, name, entry, readFileSync(join(root, name))));
    if (fd === undefined) throw corrupt(root, name, 'cannot be read: the store was closed');
    return counted(name, checkBytes(root, name, entry, readWhole(root, name, fd, entry.bytes)));
  };
  const text = (name: string, bytes: Uint8Array): string => {
    try {
      return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    } catch (error) {
      throw withCause(corrupt(root, name, 'is not valid UTF-8 text'), error);
    }
  };
  const store: OpenStore = {
    dir: root,
    manifest,
    verify,
    readBytes: async (name) => (verify === 'open' ? counted(name, await readVerified(root, name, entryOf(name))) : readBytesSync(name)),
    readText: async (name) => text(name, await store.readBytes(name)),
    readBytesSync,
    readTextSync: (name) => text(name, readBytesSync(name)),
    path(name: string): string {
      entryOf(name);
      return join(root, name);
    },
    withVerifiedPath<T>(name: string, bytes: Uint8Array, load: (path: string) => T): T {
      const path = store.path(name);
      const fd = fds.get(name);
      if (fd === undefined || sameFile(fd, path)) return load(path);
      const temp = mkdtempSync(join(tmpdir(), 'kindred-verified-'));
      try {
        const copy = join(temp, name);
        writeFileSync(copy, bytes);
        return load(copy);
      } finally {
        rmSync(temp, { recursive: true, force: true });
      }
    },
    reads: (name) => counts.get(name) ?? 0,
    close: closeAll,
  };
  if (fds.size > 0) closeOnCollect.register(store, [...fds.values()], collectToken);
  return store;
}

/** Whether `path` is still the file open as `fd` (same device and inode). */
function sameFile(fd: number, path: string): boolean {
  try {
    const a = fstatSync(fd);
    const b = statSync(path);
    return a.dev === b.dev && a.ino === b.ino;
  } catch {
    return false;
  }
}

/** The whole of an open file, `bytes` long (read from offset 0; a file that shrank is refused). */
function readWhole(root: string, name: string, fd: number, bytes: number): Uint8Array {
  const out = Buffer.allocUnsafeSlow(bytes); // its own memory (aligned, offset 0), filled below
  let at = 0;
  try {
    while (at < bytes) {
      const got = readSync(fd, out, at, bytes - at, at);
      if (got === 0) break;
      at += got;
    }
  } catch (error) {
    throw withCause(corrupt(root, name, `cannot be read (${describe(error)})`), error);
  }
  if (at !== bytes || fstatSync(fd).size !== bytes) throw corrupt(root, name, `has ${fstatSync(fd).size} bytes (expected ${bytes} from the manifest)`);
  return out;
}

/** Whether a file-system error says the path is not there (as opposed to unreadable: EACCES, EMFILE, EIO ...). */
function isNotFound(error: unknown): boolean {
  const code = error instanceof Error && 'code' in error ? error.code : undefined;
  return code === 'ENOENT' || code === 'ENOTDIR';
}

function describe(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

async function readManifest(root: string): Promise<Manifest> {
  let text: string;
  try {
    text = await readFile(join(root, MANIFEST_NAME), 'utf8');
  } catch (error) {
    if (!isNotFound(error)) {
      const reason = `store at ${root}: ${MANIFEST_NAME} is there but cannot be read (${describe(error)}); check the folder's permissions and the process's open-file limit`;
      throw withCause(new StoreError('kindred.store.corrupt', reason, { dir: root, file: MANIFEST_NAME }), error);
    }
    throw withCause(
      new StoreError('kindred.store.missing', `no store at ${root} (no ${MANIFEST_NAME}); run kindred build`, { dir: root }),
      error,
    );
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (error) {
    throw withCause(corrupt(root, MANIFEST_NAME, `is not valid JSON (${error instanceof Error ? error.message : String(error)})`), error);
  }
  const head = typeof raw === 'object' && raw !== null ? new Map<string, unknown>(Object.entries(raw)) : new Map<string, unknown>();
  const format = head.get('format');
  const version = head.get('version');
  if (format !== STORE_FORMAT || version !== STORE_FORMAT_VERSION) {
    const found = format === STORE_FORMAT ? `version ${JSON.stringify(version)}` : `format ${JSON.stringify(format)}`;
    throw new StoreError(
      'kindred.store.version',
      `store at ${root} has ${found}, expected ${STORE_FORMAT} version ${STORE_FORMAT_VERSION}; rebuild the store with kindred build`,
      { dir: root, found: JSON.stringify(format === STORE_FORMAT ? version : format), expected: STORE_FORMAT_VERSION },
    );
  }
  const parsed = manifestSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue ? issue.path.map(String).join('.') || '(root)' : '(root)';
    throw corrupt(root, MANIFEST_NAME, `${where}: ${issue?.message ?? 'invalid'}`);
  }
  return parsed.data;
}

async function readVerified(root: string, name: string, entry: FileEntry): Promise<Uint8Array> {
  let bytes: Buffer;
  try {
    bytes = await readFile(join(root, name));
  } catch (error) {
    throw withCause(corrupt(root, name, `is listed in the manifest but cannot be read (${error instanceof Error ? error.message : String(error)})`), error);
  }
  return checkBytes(root, name, entry, bytes);
}

function checkBytes(root: string, name: string, entry: FileEntry, bytes: Uint8Array): Uint8Array {
  if (bytes.byteLength !== entry.bytes) {
    throw corrupt(root, name, `has ${bytes.byteLength} bytes (expected ${entry.bytes} from the manifest)`);
  }
  const sha256 = sha256Hex(bytes);
  if (sha256 !== entry.sha256) {
    throw corrupt(root, name, `has sha256 ${sha256} (expected ${entry.sha256} from the manifest)`);
  }
  return bytes;
}

function corrupt(root: string, file: string, what: string): StoreError {
  return new StoreError('kindred.store.corrupt', `store at ${root} is corrupt: ${file} ${what}; rebuild the store with kindred build`, {
    dir: root,
    file,
  });
}
