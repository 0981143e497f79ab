/**
 * The shared float comparison (first index that differs, both values, the
 * tolerance). One implementation for the whole repository, in
 * `@girth/pipes/test-support`; a comparison helper, not library math, so the
 * oracles stay independent of the code under test.
 */
export { expectClose, findFirstMismatch, type Mismatch } from '@girth/pipes/test-support';
