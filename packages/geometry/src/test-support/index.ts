/**
 * Test helpers other packages' tests share (source only; never built or
 * published): the cone arbitraries, a labelled closeness check, and a host kind that
 * exists only in the tests (a sphere) with the surface table extended by it.
 */
export { expectNear, reducerArb } from '../cone/test-support/cone-checks.js';
export { testSphereOps, SURFACES_WITH_TEST_SPHERE, type TestSphere } from '../surfaces/test-support/test-sphere.js';
