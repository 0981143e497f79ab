/** The shared test helpers, kept in one place (`@girth/pipes/test-support`). */
export { expectAllClose, expectClose } from '@girth/pipes/test-support';
