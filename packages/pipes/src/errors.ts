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
  /** Nothing was given where a value is needed (an empty name, length or list). */
  | 'EMPTY_INPUT'
  /** A required option, key or value is missing. */
  | 'MISSING_INPUT'
  /** A number was expected and the text or value is not one. */
  | 'NOT_A_NUMBER'
  /** A number is infinite or NaN where a finite one is needed. */
  | 'NOT_FINITE'
  /** A length or count is below zero where it cannot be. */
  | 'NEGATIVE'
  /** A number lies outside its stated limits; the message names them. */
  | 'OUT_OF_RANGE'
  /** A fraction has a zero denominator (`1/0`). */
  | 'DIVIDE_BY_ZERO'
  /** A unit name Girth does not read. */
  | 'UNKNOWN_UNIT'
  /** A length written in a form Girth cannot read. */
  | 'BAD_LENGTH'
  /** Text that is not a pipe name in any form Girth reads. */
  | 'BAD_PIPE_NAME'
  /** A nominal size (NPS or DN) that no catalog table lists. */
  | 'UNKNOWN_SIZE'
  /** A schedule or weight class that the size's table does not list. */
  | 'UNKNOWN_SCHEDULE'
  /** A pipe named without a wall where the wall must be known. */
  | 'MISSING_SCHEDULE'
  /** A wall that leaves no bore, or is too thick for the pipe or plate. */
  | 'WALL_TOO_THICK'
  /** A branch larger than its header allows. */
  | 'BRANCH_TOO_LARGE'
  /** A branch offset so far that the branch misses the header. */
  | 'OFFSET_MISSES'
  /** A nozzle whose hole runs off the dished part of its head (past the knuckle onto the straight flange, or off the head). */
  | 'NOZZLE_OFF_HEAD'
  /** Two holes cut in one shell plate overlap. */
  | 'HOLES_OVERLAP'
  /** The pieces do not meet, so there is no cut to lay out. */
  | 'NO_INTERSECTION'
  /** A word that is not one of the allowed ones (a fit, a surface, a unit choice). */
  | 'BAD_CHOICE'
  /** A label with control characters, or too long to print. */
  | 'BAD_TEXT'
  /** An option that is not accepted (unknown, given twice, or doing nothing with the others given). */
  | 'BAD_OPTION'
  /** A job file or data structure that does not have the expected shape. */
  | 'BAD_JOB'
  /** A file that cannot be read (missing, no permission, a FIFO), naming the option or path. */
  | 'CANNOT_READ'
  /** A file or folder that cannot be written (read-only, no permission, disk full, name too long). */
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
