import { readFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { StoreError } from '../errors/KindredError.ts';
import { withCause } from '../errors/withCause.ts';
import { fileNameProblem } from './checkFileName.ts';
import { type FileEntry, MANIFEST_NAME, type Manifest, manifestSchema, STORE_FORMAT, STORE_FORMAT_VERSION } from './manifest.ts';
import { sha256Hex } from './sha256Hex.ts';

/** A store whose manifest and files have all been checked. */
export interface OpenStore {
  readonly dir: string;
  readonly manifest: Manifest;
  /** Bytes of a listed file, read again and checked again against the manifest (size and sha256). */
  readBytes(name: string): Promise<Uint8Array>;
  /** A listed file as UTF-8 text, checked like `readBytes`. */
  readText(name: string): Promise<string>;
  /**
   * Path of a listed file, for readers that take a path (the native index). The file was verified
   * when the store was opened; nothing else in Kindred writes into a store after that.
   */
  path(name: string): string;
}

/**
 * Opens the store in `dir`: reads and checks `manifest.json` (format tag, version, shape), then checks
 * the size and sha256 of every listed file before anything is parsed. Files not listed are ignored.
 *
 * Throws StoreError:
 * - `kindred.store.missing`: no folder or no manifest;
 * - `kindred.store.version`: another format or version (found and expected named);
 * - `kindred.store.corrupt`: unreadable manifest, bad shape, or a file of the wrong size or checksum.
 */
export async function openStore(dir: string): Promise<OpenStore> {
  const root = resolve(dir);
  const manifest = await readManifest(root);
  const entries = new Map(Object.entries(manifest.files));
  for (const [name, entry] of entries) {
    const problem = fileNameProblem(name);
    if (problem) throw corrupt(root, MANIFEST_NAME, `lists file ${JSON.stringify(name)}, which ${problem}`);
    await readVerified(root, name, entry);
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
  const readBytes = async (name: string): Promise<Uint8Array> => readVerified(root, name, entryOf(name));
  return {
    dir: root,
    manifest,
    readBytes,
    async readText(name: string): Promise<string> {
      const bytes = await readBytes(name);
      try {
        return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
      } catch (error) {
        throw withCause(corrupt(root, name, 'is not valid UTF-8 text'), error);
      }
    },
    path(name: string): string {
      entryOf(name);
      return join(root, name);
    },
  };
}

async function readManifest(root: string): Promise<Manifest> {
  let text: string;
  try {
    text = await readFile(join(root, MANIFEST_NAME), 'utf8');
  } catch (error) {
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
