/**
 * Float checks for tests of plane cuts and miters: each reports the label and
 * the first index that differs, and the tolerance it was held to.
 */
import { expect } from 'vitest';

export { expectAllClose, expectClose } from '@girth/pipes/test-support';

/** Asserts two 3D points agree within tol (Euclidean distance). */
export function expectPointClose(actual: readonly number[], expected: readonly number[], tol: number, label: string): void {
  const d = Math.hypot(
    (actual[0] ?? NaN) - (expected[0] ?? NaN),
    (actual[1] ?? NaN) - (expected[1] ?? NaN),
    (actual[2] ?? NaN) - (expected[2] ?? NaN),
  );
  if (!(d <= tol)) expect.fail(`${label}: got [${actual.join(', ')}], expected [${expected.join(', ')}] ± ${tol} (${d} apart)`);
}

/** Station angles (radians) of n equal stations from phi = 0 (station n at 360 (n−1)/N degrees). */
export function stationPhis(n: number): number[] {
  return Array.from({ length: n }, (_, i) => (2 * Math.PI * i) / n);
}
