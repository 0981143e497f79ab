/**
 * Acceptance tests, the oracles' self-tests and the support helpers' tests.
 * Same resolution and timeout as every package (workspace sources through the
 * `source` condition), with this folder's own include list.
 */
import { defineConfig } from 'vitest/config';
import shared from '../vitest.shared.js';

export default defineConfig({
  ...shared,
  test: {
    ...shared.test,
    include: ['acceptance/**/*.test.ts', 'oracle/**/*.test.ts', 'support/**/*.test.ts', 'packaging/**/*.test.ts'],
  },
});
