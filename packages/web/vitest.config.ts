/**
 * The page's tests: unit tests beside the code (src/) run in Node; the browser
 * tests (test/) drive the built page in Debian's chromium, one browser, one
 * file at a time, with generous timeouts for a small loaded machine.
 */
import { defineConfig, mergeConfig } from 'vitest/config';
import shared from '../../vitest.shared.js';

export default mergeConfig(
  shared,
  defineConfig({
    test: {
      include: ['src/**/*.test.ts', 'test/**/*.test.ts'],
      globalSetup: ['test/build-page.ts'],
      fileParallelism: false,
      testTimeout: 180_000,
      hookTimeout: 300_000,
    },
  }),
);
