/**
 * Tolerance assertions for the DXF tests.
 */
import { expect } from 'vitest';

/** Expects |actual - expected| <= tol, naming the quantity in the failure. */
export function expectClose(actual: number, expected: number, tol: number, label: string): void {
  expect(Number.isFinite(actual), `${label}: ${actual} is not finite`).toBe(true);
  expect(Math.abs(actual - expected), `${label}: got ${actual}, expected ${expected} ± ${tol}`).toBeLessThanOrEqual(tol);
}

/** Expects two lists to agree element-wise within `tol`, reporting the first index that differs. */
export function expectAllClose(actual: readonly number[], expected: readonly number[], tol: number, label: string): void {
  expect(actual.length, `${label}: length`).toBe(expected.length);
  const i = actual.findIndex((a, k) => !(Math.abs(a - expected[k]!) <= tol));
  expect(i, i < 0 ? label : `${label}[${i}]: got ${actual[i]}, expected ${expected[i]} ± ${tol}`).toBe(-1);
}
