/**
 * The page's build: one self-contained HTML file (dist/index.html) that opens
 * from disk with no network. The library is read from its TypeScript sources
 * (the `source` export condition); any Node built-in fails the build, since
 * the page runs in a browser.
 */
import { builtinModules } from 'node:module';
import { defaultClientConditions, defineConfig } from 'vite';
import { singleFile } from './build/single-file.js';

const NODE_BUILTINS = new Set([...builtinModules, ...builtinModules.map((m) => `node:${m}`)]);

export default defineConfig({
  base: './',
  resolve: { conditions: ['source', ...defaultClientConditions] },
  plugins: [
    {
      name: 'girth-refuse-node-builtins',
      enforce: 'pre',
      resolveId(id, importer) {
        if (NODE_BUILTINS.has(id)) this.error(`${importer ?? 'the page'} imports the Node built-in "${id}"; the page runs in a browser`);
        return null;
      },
    },
    singleFile(),
  ],
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    target: 'es2022',
    assetsInlineLimit: Number.MAX_SAFE_INTEGER,
    cssCodeSplit: false,
    modulePreload: false,
    chunkSizeWarningLimit: 4000,
    reportCompressedSize: false,
  },
});
