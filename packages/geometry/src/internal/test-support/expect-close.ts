/**
 * Test helper: compare numbers or arrays of numbers within an absolute
 * tolerance and report the first index that differs. Lives under
 * `test-support/`, which the build leaves out; only tests import it.
 */

/**
 * Throws unless `actual` and `expected` agree within `tol` (absolute, in the
 * unit of the values) at every index. The message names `label`, the first
 * index that differs, both values and the difference. NaN never passes.
 *
 * @param tol absolute tolerance, ≥ 0.
 * @throws Error describing the first mismatch (length, NaN or value).
 * @example expectClose([1, 2.0004], [1, 2], 1e-3, 'cutback mm')
 */
export function expectClose(
  actual: number | readonly number[],
  expected: number | readonly number[],
  tol: number,
  label: string,
): void {
  if (!(tol >= 0)) throw new Error(`${label}: tolerance must be >= 0, got ${tol}`);
  const a = typeof actual === 'number' ? [actual] : actual;
  const e = typeof expected === 'number' ? [expected] : expected;
  if (a.length !== e.length) {
    throw new Error(`${label}: length ${a.length}, expected ${e.length}`);
  }
  for (let i = 0; i < a.length; i++) {
    const ai = a[i] as number;
    const ei = e[i] as number;
    const diff = Math.abs(ai - ei);
    if (!(diff <= tol)) {
      const where = typeof actual === 'number' ? '' : ` at index ${i}`;
      throw new Error(`${label}${where}: got ${ai}, expected ${ei} ± ${tol} (off by ${diff})`);
    }
  }
}
