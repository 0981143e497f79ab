/**
 * Test helpers other packages' tests share (source only; never built or
 * published): the cone arbitraries and a labelled closeness check.
 */
export { expectNear, reducerArb } from '../cone/test-support/cone-checks.js';
