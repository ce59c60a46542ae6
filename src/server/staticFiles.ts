import { readdir, readFile } from 'node:fs/promises';
import { extname, join, relative, sep } from 'node:path';

export interface StaticFile {
  readonly body: Buffer;
  readonly type: string;
  /** Hashed file names never change: cache them; the HTML page is always revalidated. */
  readonly immutable: boolean;
}

const TYPES: ReadonlyMap<string, string> = new Map([
  ['.html', 'text/html; charset=utf-8'],
  ['.js', 'text/javascript; charset=utf-8'],
  ['.css', 'text/css; charset=utf-8'],
  ['.svg', 'image/svg+xml'],
  ['.png', 'image/png'],
  ['.ico', 'image/x-icon'],
  ['.json', 'application/json; charset=utf-8'],
  ['.txt', 'text/plain; charset=utf-8'],
]);

/** Largest bundle the server keeps in memory (the page with vega is a few MB). */
const MAX_TOTAL_BYTES = 64 * 1024 * 1024;

/**
 * The bundled page, read once: a map from URL path (`/`, `/assets/index-abc.js`) to file. Only
 * regular files of a known type under `root` are listed, so a request for anything else (a `..`
 * path, an encoded `%2e%2e`, a symlink out) matches nothing: paths are looked up, never joined.
 * Returns null when `root` does not exist (the page is not built).
 */
export async function loadStaticFiles(root: string): Promise<ReadonlyMap<string, StaticFile> | null> {
  let entries;
  try {
    entries = await readdir(root, { recursive: true, withFileTypes: true });
  } catch {
    return null;
  }
  const files = new Map<string, StaticFile>();
  let total = 0;
  for (const e of entries) {
    if (!e.isFile()) continue;
    const full = join(e.parentPath, e.name);
    const type = TYPES.get(extname(e.name).toLowerCase());
    if (type === undefined) continue;
    const rel = relative(root, full).split(sep).join('/');
    if (rel.startsWith('..') || rel.split('/').some((part) => part.startsWith('.'))) continue;
    const body = await readFile(full);
    total += body.length;
    if (total > MAX_TOTAL_BYTES) throw new RangeError(`${root}: the page is larger than ${MAX_TOTAL_BYTES} bytes`);
    files.set(`/${rel}`, { body, type, immutable: rel.startsWith('assets/') });
  }
  const index = files.get('/index.html');
  if (!index) return null;
  files.set('/', index);
  return files;
}
