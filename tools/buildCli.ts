/**
 * Compiles the CLI once (at install: `npm run build`, which `prepare` runs) into one ES module,
 * dist/cli.js, so that `bin/kindred.js` starts without compiling TypeScript on every command.
 * The packages it uses are bundled too (one file loads far faster than hundreds of small modules),
 * except hnswlib-node (native) and vega / vega-lite (large, and loaded only when a chart is drawn).
 * Each source file's `import.meta.url` is rewritten to that file's own URL, computed from the bundle's
 * place, so paths like `new URL('../web/dist', import.meta.url)` mean what they mean in the sources,
 * wherever the project folder is moved.
 *
 *   node --import tsx tools/buildCli.ts [outfile]     (default dist/cli.js)
 */
import { readFile, rename, rm } from 'node:fs/promises';
import { dirname, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build, type Plugin } from 'esbuild';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const outfile = resolve(process.argv[2] ?? resolve(root, 'dist', 'cli.js'));
const temp = `${outfile}.tmp-${process.pid}`;

const ownImportMetaUrl: Plugin = {
  name: 'own-import-meta-url',
  setup(b) {
    b.onLoad({ filter: /\.ts$/ }, async (args) => {
      const source = await readFile(args.path, 'utf8');
      if (!source.includes('import.meta.url')) return { contents: source, loader: 'ts' };
      const fromBundle = relative(dirname(outfile), args.path).split('\\').join('/');
      return { contents: source.replaceAll('import.meta.url', `new URL(${JSON.stringify(fromBundle)}, import.meta.url).href`), loader: 'ts' };
    });
  },
};

try {
  await build({
    entryPoints: [resolve(root, 'src', 'cli', 'main.ts')],
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
  await rename(temp, outfile);
} catch (error) {
  await rm(temp, { force: true });
  throw error;
}
