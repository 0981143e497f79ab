/**
 * Builds the page once before the tests (vite build, the same as `pnpm
 * build`), so the browser tests always drive the current sources.
 */
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';

/** The package folder. */
const root = join(dirname(fileURLToPath(import.meta.url)), '..');

/** Vitest's global setup. */
export default async function setup(): Promise<void> {
  await build({ root, configFile: join(root, 'vite.config.ts'), logLevel: 'warn' });
}
