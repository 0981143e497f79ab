/**
 * Comparing numbers within a stated tolerance, with a label in the failure.
 */
import { expect } from 'vitest';

/** Asserts `|actual - expected| <= tol`; the message names `label` and both values. */
export function expectClose(actual: unknown, expected: number, tol: number, label: string): void {
  expect(typeof actual, `${label}: expected a number, got ${String(actual)}`).toBe('number');
  const a = actual as number;
  expect(Number.isFinite(a), `${label}: not finite (${a})`).toBe(true);
  const diff = Math.abs(a - expected);
  expect(diff <= tol, `${label}: got ${a}, expected ${expected} ± ${tol} (off by ${diff})`).toBe(true);
}
