/** The shared test helper, kept in one place (`@girth/pipes/test-support`). */
export { expectClose } from '@girth/pipes/test-support';
