/**
 * Compiles the CLI once (at install: `npm run build`, which `prepare` runs) into one ES module,
 * dist/cli.js, so that `bin/kindred.js` starts without compiling TypeScript on every command.
 * The packages it uses are bundled too (one file loads far faster than hundreds of small modules),
 * except hnswlib-node (native) and vega / vega-lite (large, and loaded only when a chart is drawn).
 * Each source file's `import.meta.url` is rewritten to that file's own URL, computed from the bundle's
 * place, so paths like `new URL('../web/dist', import.meta.url)` mean what they mean in the sources,
 * wherever the project folder is moved. The server's answer worker is compiled beside it
 * (dist/answerWorker.js), and src/server/pool/workerEntry.ts is made to name that file.
 *
 *   node --import tsx tools/buildCli.ts [outfile]     (default dist/cli.js)
 */
import { readFile, rename, rm } from 'node:fs/promises';
import { basename, dirname, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build, type Plugin } from 'esbuild';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const outfile = resolve(process.argv[2] ?? resolve(root, 'dist', 'cli.js'));
const workerOut = resolve(dirname(outfile), 'answerWorker.js');
const workerEntry = resolve(root, 'src', 'server', 'pool', 'workerEntry.ts');

const ownImportMetaUrl: Plugin = {
  name: 'own-import-meta-url',
  setup(b) {
    b.onLoad({ filter: /\.ts$/ }, async (args) => {
      if (args.path === workerEntry) return { contents: `export const WORKER_ENTRY = new URL('./${basename(workerOut)}', import.meta.url);`, loader: 'ts' };
      const source = await readFile(args.path, 'utf8');
      if (!source.includes('import.meta.url')) return { contents: source, loader: 'ts' };
      const fromBundle = relative(dirname(outfile), args.path).split('\\').join('/');
      return { contents: source.replaceAll('import.meta.url', `new URL(${JSON.stringify(fromBundle)}, import.meta.url).href`), loader: 'ts' };
    });
  },
};

/** Compiles `entry` into `out` (through a temp file, renamed when done). */
async function compile(entry: string, out: string): Promise<void> {
  const temp = `${out}.tmp-${process.pid}`;
  try {
    await build({
      entryPoints: [entry],
      outfile: temp,
      bundle: true,
      platform: 'node',
      format: 'esm',
      target: 'node20',
      external: ['hnswlib-node', 'vega', 'vega-lite'],
      // bundled CommonJS packages call require() for Node's own modules
      banner: { js: "import { createRequire as kindredCreateRequire } from 'node:module'; const require = kindredCreateRequire(import.meta.url);" },
      plugins: [ownImportMetaUrl],
      logLevel: 'warning',
    });
    await rename(temp, out);
  } catch (error) {
    await rm(temp, { force: true });
    throw error;
  }
}

// the worker first: bin/kindred.js runs dist/cli.js when it is newer than the sources
await compile(resolve(root, 'src', 'server', 'pool', 'answerWorker.ts'), workerOut);
await compile(resolve(root, 'src', 'cli', 'main.ts'), outfile);
