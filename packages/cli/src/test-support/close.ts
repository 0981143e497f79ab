/**
 * Comparing numbers read back from JSON within a stated tolerance: checks the
 * value is a number, then uses the shared helper (`@girth/pipes/test-support`).
 */
import { expect } from 'vitest';
import { expectClose as shared } from '@girth/pipes/test-support';

/** Asserts `actual` is a number with `|actual - expected| <= tol`; the message names `label` and both values. */
export function expectClose(actual: unknown, expected: number, tol: number, label: string): void {
  expect(typeof actual, `${label}: expected a number, got ${String(actual)}`).toBe('number');
  shared(actual as number, expected, tol, label);
}
