/**
 * Tests that run the built program first check it is built from the current sources.
 */
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { CLI_PACKAGE_DIR, DIST_MAIN } from './paths.js';

/** Fails with what to do when the program is not built, or built from older sources. */
export function requireBuild(): void {
  if (!existsSync(DIST_MAIN)) {
    throw new Error(`${DIST_MAIN} is missing: run \`pnpm run build\` in the repository root first`);
  }
  const src = join(CLI_PACKAGE_DIR, 'src');
  const stale: string[] = [];
  const visit = (dir: string): void => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const full = join(dir, entry.name);
      if (entry.isDirectory()) {
        if (entry.name !== 'test-support') visit(full);
      } else if (entry.name.endsWith('.ts') && !entry.name.endsWith('.test.ts')) {
        const built = join(CLI_PACKAGE_DIR, 'dist', full.slice(src.length + 1).replace(/\.ts$/, '.js'));
        if (!existsSync(built) || statSync(built).mtimeMs < statSync(full).mtimeMs) stale.push(full.slice(src.length + 1));
      }
    }
  };
  visit(src);
  if (stale.length > 0) throw new Error(`packages/cli/dist is older than ${stale.join(', ')}: run \`pnpm run build\` in the repository root`);
}
