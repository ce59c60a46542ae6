/** Builds the page with vite when src/web/dist is missing or older than a source file of the page. */
import { readdir, rename, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';

export const WEB_SRC = fileURLToPath(new URL('../../src/web', import.meta.url));
export const WEB_DIST = join(WEB_SRC, 'dist');

async function newest(dir: string, skip: (name: string) => boolean): Promise<number> {
  let latest = 0;
  for (const e of await readdir(dir, { withFileTypes: true })) {
    if (skip(e.name)) continue;
    const p = join(dir, e.name);
    latest = Math.max(latest, e.isDirectory() ? await newest(p, skip) : (await stat(p)).mtimeMs);
  }
  return latest;
}

export async function ensureWebBuilt(): Promise<void> {
  const sources = await newest(WEB_SRC, (n) => n === 'dist' || n.startsWith('dist.tmp-'));
  const built = await stat(join(WEB_DIST, 'index.html')).then((s) => s.mtimeMs, () => 0);
  if (built > sources) return;
  const tmp = join(WEB_SRC, `dist.tmp-${process.pid}`);
  await build({ configFile: join(WEB_SRC, 'vite.config.ts'), build: { outDir: tmp, emptyOutDir: true }, logLevel: 'error' });
  await rm(WEB_DIST, { recursive: true, force: true });
  await rename(tmp, WEB_DIST);
}
