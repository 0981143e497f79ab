/**
 * The one error type of Girth. Every layer throws it for bad input, with a
 * stable machine-readable `code`, the offending `field` and `value`, and a
 * message a fitter understands.
 */

/**
 * Stable error codes, one per kind of mistake; {@link ERROR_CODES} in
 * `codes.ts` says what each means. Never reuse one for another kind; add new
 * ones freely.
 */
export type GirthErrorCode =
  | 'EMPTY_INPUT'
  | 'MISSING_INPUT'
  | 'NOT_A_NUMBER'
  | 'NOT_FINITE'
  | 'NEGATIVE'
  | 'OUT_OF_RANGE'
  | 'DIVIDE_BY_ZERO'
  | 'UNKNOWN_UNIT'
  | 'BAD_LENGTH'
  | 'BAD_PIPE_NAME'
  | 'UNKNOWN_SIZE'
  | 'UNKNOWN_SCHEDULE'
  | 'MISSING_SCHEDULE'
  | 'WALL_TOO_THICK'
  | 'BRANCH_TOO_LARGE'
  | 'OFFSET_MISSES'
  | 'NO_INTERSECTION'
  | 'BAD_CHOICE'
  | 'BAD_TEXT'
  | 'BAD_OPTION'
  | 'BAD_JOB'
  | 'CANNOT_READ'
  | 'CANNOT_WRITE';

/**
 * A typed error for input Girth cannot accept.
 *
 * @example
 * ```ts
 * try { parseLength('1/0'); } catch (e) {
 *   if (e instanceof GirthError) console.log(e.code, e.field); // DIVIDE_BY_ZERO length
 * }
 * ```
 */
export class GirthError extends Error {
  /** Stable code, for programs. */
  readonly code: GirthErrorCode;
  /** The input field at fault, e.g. `branch`, `angleDeg`, `jobs[2].header`. */
  readonly field: string;
  /** The offending value as given (string or number), when there is one. */
  readonly value: unknown;

  constructor(code: GirthErrorCode, field: string, message: string, value?: unknown) {
    super(message);
    this.name = 'GirthError';
    this.code = code;
    this.field = field;
    this.value = value;
  }

  /** The same error with its field renamed (e.g. a parser's `length` becomes `offset`). */
  withField(field: string): GirthError {
    const message = this.message.startsWith(`${this.field}:`)
      ? `${field}:${this.message.slice(this.field.length + 1)}`
      : this.message;
    return new GirthError(this.code, field, message, this.value);
  }
}

/** True when `e` is a {@link GirthError}, optionally with the given code. */
export function isGirthError(e: unknown, code?: GirthErrorCode): e is GirthError {
  return e instanceof GirthError && (code === undefined || e.code === code);
}

/**
 * Something the caller should know that does not stop the layout: a shallow
 * lateral, a miter cut angle over the code's limit. Stable `code`, a message a
 * fitter understands, and the field it concerns when there is one.
 */
export interface GirthWarning {
  readonly code: string;
  readonly message: string;
  readonly field?: string;
}
