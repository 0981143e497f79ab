/**
 * Float checks for tests of plane cuts and miters: each reports the label and
 * the first index that differs, and the tolerance it was held to.
 */
import { expect } from 'vitest';

/** Asserts |actual − expected| ≤ tol, naming `label` in the failure. */
export function expectClose(actual: number, expected: number, tol: number, label: string): void {
  const ok = Number.isFinite(actual) && Math.abs(actual - expected) <= tol;
  if (!ok) expect.fail(`${label}: got ${actual}, expected ${expected} ± ${tol} (off by ${actual - expected})`);
}

/** Asserts two equal-length number lists agree element by element within tol. */
export function expectAllClose(actual: readonly number[], expected: readonly number[], tol: number, label: string): void {
  expect(actual.length, `${label}: length`).toBe(expected.length);
  actual.forEach((a, i) => expectClose(a, expected[i] as number, tol, `${label}[${i}]`));
}

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
