/** The shared test helper, kept in one place (geometry's test support). */
export { expectClose } from '../../../../geometry/src/internal/test-support/expect-close.js';
