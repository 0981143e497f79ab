/** The shared test helper, kept in one place (`src/test-support/expect-close.ts`). */
export { expectClose } from '../../test-support/expect-close.js';
