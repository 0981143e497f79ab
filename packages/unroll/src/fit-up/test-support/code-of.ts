/** Test helper: the typed error a call throws, as `code:field`. */
import { isGirthError } from '@girth/pipes';

/** `code:field` of the GirthError `f` throws, or undefined when it throws none (other errors pass through). */
export function codeOf(f: () => unknown): string | undefined {
  try {
    f();
  } catch (e) {
    if (isGirthError(e)) return `${e.code}:${e.field}`;
    throw e;
  }
  return undefined;
}
