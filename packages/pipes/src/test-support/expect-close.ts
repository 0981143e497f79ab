/**
 * The one float comparison for tests, shared by every package and the
 * acceptance tests: it names what differs (the label, the first index that is
 * off, both values and the tolerance). Lives under `test-support/`, which the
 * build leaves out; other packages import it from `@girth/pipes/test-support`.
 * The older per-package helpers (`expectNear`, `expectAllClose`, the copies in
 * svg, dxf, geometry, unroll and cli) now re-export this one.
 */

/** The first disagreement found by {@link findFirstMismatch}. */
export interface Mismatch {
  readonly kind: 'mismatch';
  /** Index into the arrays, or -1 for scalars and for a length mismatch. */
  readonly index: number;
  readonly actual: number;
  readonly expected: number;
  readonly message: string;
}

/**
 * The first place where `actual` and `expected` differ by more than `tol`
 * (absolute), or `undefined` when they agree. NaN never agrees with anything;
 * equal infinities agree. Arrays must have the same length.
 *
 * @param tol absolute tolerance, >= 0, in the units of the values.
 * @throws Error when `tol` is negative or not finite.
 * @example findFirstMismatch([1, 2], [1, 2.5], 0.1, 'x')?.index // 1
 */
export function findFirstMismatch(
  actual: number | readonly number[],
  expected: number | readonly number[],
  tol: number,
  label: string,
): Mismatch | undefined {
  if (!(tol >= 0) || !Number.isFinite(tol)) throw new Error(`expectClose(${label}): tolerance must be a finite number >= 0, got ${tol}`);
  const a = typeof actual === 'number' ? [actual] : actual;
  const e = typeof expected === 'number' ? [expected] : expected;
  const scalar = typeof actual === 'number' && typeof expected === 'number';
  if (a.length !== e.length) {
    return {
      kind: 'mismatch',
      index: -1,
      actual: a.length,
      expected: e.length,
      message: `${label}: length ${a.length}, expected ${e.length}`,
    };
  }
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    const y = e[i]!;
    const same = x === y || Math.abs(x - y) <= tol;
    if (!same) {
      const where = scalar ? '' : `[${i}]`;
      return {
        kind: 'mismatch',
        index: scalar ? -1 : i,
        actual: x,
        expected: y,
        message: `${label}${where}: got ${x}, expected ${y}, difference ${x - y} exceeds tolerance ${tol}`,
      };
    }
  }
  return undefined;
}

/**
 * Assert that `actual` is within `tol` (absolute) of `expected`, element by
 * element; the failure names the label and the first index that differs.
 *
 * @param tol absolute tolerance, >= 0, in the units of the values.
 * @throws Error describing the first mismatch.
 * @example expectClose(Math.PI * 100, 314.159265, 1e-6, 'stretch-out of a 100 mm OD')
 */
export function expectClose(
  actual: number | readonly number[],
  expected: number | readonly number[],
  tol: number,
  label: string,
): void {
  const m = findFirstMismatch(actual, expected, tol, label);
  if (m) throw new Error(m.message);
}

/**
 * The same check for two lists (kept for the tests that named it so).
 * @example expectAllClose([1, 2], [1, 2.0001], 1e-3, 'girths')
 */
export function expectAllClose(actual: readonly number[], expected: readonly number[], tol: number, label: string): void {
  expectClose(actual, expected, tol, label);
}
