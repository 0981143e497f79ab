/**
 * Shared vitest settings: every package tests against the TypeScript sources of
 * the other packages (the `source` export condition), so no build is needed to
 * run a package's own tests.
 */
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['source'] },
  ssr: { resolve: { conditions: ['source'] } },
  test: {
    include: ['src/**/*.test.ts', '*.test.ts', 'acceptance/**/*.test.ts'],
    testTimeout: 60_000,
  },
});
