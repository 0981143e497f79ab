/**
 * Building a {@link Pipe} from dimensions, with the checks every pipe passes.
 */
import { GirthError } from '../errors.js';
import { DIAMETER_MM, requireWithin, WALL_MM } from '../limits.js';
import { requireFinite } from '../validate.js';
import type { Pipe, PipeStandard } from './types.js';

/** What a pipe is made of before its checks: dimensions in mm, label and origin. */
export interface PipeParts {
  readonly odMm: number;
  readonly wallMm: number;
  readonly label: string;
  readonly standard: PipeStandard;
  readonly nps?: string;
  readonly npsIn?: number;
  readonly dn?: number;
  readonly schedule?: string;
}

/**
 * A number with at most `decimals` digits after the point and no trailing
 * zeros: `406.4`, `9.53`, `9.525`.
 * @example trimmedNumber(9.5250001) // '9.525'
 */
export function trimmedNumber(value: number, decimals = 3): string {
  const text = String(Number(value.toFixed(decimals)));
  return text === '-0' ? '0' : text;
}

/**
 * The value when finite and above zero; errors name the dimension (`OD`,
 * `wall`) and the pipe.
 * @throws GirthError `NOT_A_NUMBER`/`NOT_FINITE`/`NEGATIVE` with `field`.
 */
export function positive(value: number, field: string, what: string, label: string): number {
  let v: number;
  try {
    v = requireFinite(value, field);
  } catch (e) {
    if (e instanceof GirthError) throw new GirthError(e.code, field, `${field}: the ${what} of ${label} must be a finite number of mm, got ${String(value)}`, value);
    throw e;
  }
  if (v <= 0) throw new GirthError('NEGATIVE', field, `${field}: the ${what} of ${label} must be greater than 0 mm, got ${v}`, value);
  return v;
}

/**
 * The pipe, once its dimensions pass the checks.
 * @throws GirthError `NOT_A_NUMBER`/`NOT_FINITE` for NaN or infinite values,
 *   `NEGATIVE` for an OD or wall at or below zero, `OUT_OF_RANGE` for an OD
 *   or wall outside `DIAMETER_MM` / `WALL_MM` (limits.ts), `WALL_TOO_THICK`
 *   for a wall of half the OD or more; all with `field`.
 */
export function makePipe(parts: PipeParts, field: string): Pipe {
  const odMm = positive(parts.odMm, field, 'OD', parts.label);
  const wallMm = positive(parts.wallMm, field, 'wall', parts.label);
  requireWithin(odMm, field, { ...DIAMETER_MM, what: `the OD of ${parts.label}` });
  requireWithin(wallMm, field, { ...WALL_MM, what: `the wall of ${parts.label}` });
  if (2 * wallMm >= odMm) {
    throw new GirthError(
      'WALL_TOO_THICK',
      field,
      `${field}: wall ${trimmedNumber(wallMm)} mm is half the OD ${trimmedNumber(odMm)} mm or more; the wall must be less than ${trimmedNumber(odMm / 2)} mm`,
      parts.label,
    );
  }
  const pipe: Pipe = {
    kind: 'pipe',
    label: parts.label,
    odMm,
    wallMm,
    idMm: odMm - 2 * wallMm,
    standard: parts.standard,
    ...(parts.nps !== undefined ? { nps: parts.nps } : {}),
    ...(parts.npsIn !== undefined ? { npsIn: parts.npsIn } : {}),
    ...(parts.dn !== undefined ? { dn: parts.dn } : {}),
    ...(parts.schedule !== undefined ? { schedule: parts.schedule } : {}),
  };
  return pipe;
}
