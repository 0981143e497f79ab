/**
 * Comparing floats in tests with a stated tolerance and a label.
 */
import { expect } from 'vitest';

/** Asserts |actual - expected| <= tol, naming what was compared. */
export function expectClose(actual: number, expected: number, tol: number, label: string): void {
  const ok = Number.isFinite(actual) && Math.abs(actual - expected) <= tol;
  expect(ok, `${label}: expected ${expected} ± ${tol}, got ${actual}`).toBe(true);
}
