// Bundles the built command (dist/main.js and everything it imports,
// @girth/* and zod included) into dist/bin/, for start-up: Node then reads a
// handful of files instead of about 45 modules for `girth --help`. The lazy
// imports (a joint's layout and exporters, `run`'s job validator) stay
// separate chunks, so a simple command loads none of them. bin/girth.js runs
// dist/bin/main.js. The library entry (dist/index.js) is left as tsc wrote it.
import { rmSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { rolldown } from 'rolldown';

const root = join(fileURLToPath(new URL('.', import.meta.url)), '..');
const outDir = join(root, 'dist', 'bin');
rmSync(outDir, { recursive: true, force: true });
const bundle = await rolldown({ input: { main: join(root, 'dist', 'main.js') }, platform: 'node', logLevel: 'warn' });
await bundle.write({ dir: outDir, format: 'esm', entryFileNames: '[name].js', chunkFileNames: '[name]-[hash].js' });
await bundle.close();
