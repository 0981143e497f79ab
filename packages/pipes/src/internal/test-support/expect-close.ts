/**
 * Test helper: compare numbers within an absolute tolerance and name what
 * differs. Lives under `test-support/`, which the build leaves out; only tests
 * import it.
 */

/**
 * Throws unless `actual` is within `tol` of `expected` (absolute, in the unit of
 * the values). NaN never passes.
 *
 * @param tol absolute tolerance, ≥ 0.
 * @throws Error naming `label`, both values and the difference.
 * @example expectClose(406.4, 16 * 25.4, 1e-9, 'NPS 16 OD mm')
 */
export function expectClose(actual: number, expected: number, tol: number, label: string): void {
  if (!(tol >= 0)) throw new Error(`${label}: tolerance must be >= 0, got ${tol}`);
  if (Number.isNaN(actual) || Number.isNaN(expected)) {
    throw new Error(`${label}: got ${actual}, expected ${expected} (NaN never passes)`);
  }
  const diff = Math.abs(actual - expected);
  if (!(diff <= tol)) {
    throw new Error(`${label}: got ${actual}, expected ${expected}, off by ${diff} (tolerance ${tol})`);
  }
}
