/**
 * Where the tests find the repository's own files: the demo job, the launcher
 * and the built program. Computed from this file's location, never from the
 * working directory (tests change it).
 */
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';

/** packages/cli */
export const CLI_PACKAGE_DIR = fileURLToPath(new URL('../../', import.meta.url));
/** The repository root. */
export const REPO_ROOT = join(CLI_PACKAGE_DIR, '..', '..');
/** The demo job of our invented plant. */
export const DEMO_JOB = join(REPO_ROOT, 'fixtures', 'demo', 'job.json');
/** The `girth` launcher kept in git. */
export const BIN_PATH = join(CLI_PACKAGE_DIR, 'bin', 'girth.js');
/** The built program the launcher imports (`pnpm run build` makes it). */
export const DIST_MAIN = join(CLI_PACKAGE_DIR, 'dist', 'main.js');
