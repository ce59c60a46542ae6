import { defineConfig } from 'vite';
import { fileURLToPath } from 'node:url';

/** The page is built from this folder into dist/ (served by `kindred serve`); nothing is loaded from the network. */
export default defineConfig({
  root: fileURLToPath(new URL('.', import.meta.url)),
  base: '/',
  logLevel: 'warn',
  build: {
    outDir: fileURLToPath(new URL('./dist', import.meta.url)),
    emptyOutDir: true,
    sourcemap: false,
    chunkSizeWarningLimit: 4000,
    modulePreload: { polyfill: false },
  },
});
