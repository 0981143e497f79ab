/**
 * Test helpers: run a function that should refuse its input and hand back the
 * GirthError it throws. Lives under `test-support/`, which the build leaves out;
 * only tests import it (other packages through `@girth/pipes/test-support`).
 */
import { GirthError } from '../errors.js';

/** How a thrown value reads in a failure message. */
function describeThrown(e: unknown): string {
  if (e instanceof Error) return `${e.name}: ${e.message}`;
  return `${typeof e} ${String(e)}`;
}

/**
 * Runs `fn` and returns the {@link GirthError} it throws.
 *
 * @param fn the call under test; its return value is ignored.
 * @returns the GirthError `fn` threw.
 * @throws Error `expected a GirthError, nothing was thrown` when `fn` returns,
 *   and `expected a GirthError, got …` (with the thrown value as `cause`) when it
 *   throws anything else, so the test fails naming what happened.
 * @example
 * const e = girthErrorOf(() => parseLength('1/0'));
 * expect(e.code).toBe('DIVIDE_BY_ZERO');
 */
export function girthErrorOf(fn: () => unknown): GirthError {
  try {
    fn();
  } catch (e) {
    if (e instanceof GirthError) return e;
    throw new Error(`expected a GirthError, got ${describeThrown(e)}`, { cause: e });
  }
  throw new Error('expected a GirthError, nothing was thrown');
}

/**
 * Runs `fn`, checks that it throws a {@link GirthError} with this `code` (and this
 * `field`, when one is given) and returns the error for further checks.
 *
 * @param fn the call under test.
 * @param code the stable error code expected.
 * @param field the input field expected at fault; not checked when omitted.
 * @returns the GirthError `fn` threw.
 * @throws Error as {@link girthErrorOf} does, and `expected GirthError CODE on
 *   FIELD, got CODE on FIELD (message)` when the code or the field differ.
 * @example
 * expectGirthError(() => planeCutGeometry({ pipe, angleDeg: 0 }), 'OUT_OF_RANGE', 'angleDeg');
 */
export function expectGirthError(fn: () => unknown, code: GirthError['code'], field?: string): GirthError {
  const e = girthErrorOf(fn);
  if (e.code !== code || (field !== undefined && e.field !== field)) {
    const wanted = field === undefined ? code : `${code} on ${field}`;
    throw new Error(`expected GirthError ${wanted}, got ${e.code} on ${e.field} (${e.message})`, { cause: e });
  }
  return e;
}
