/**
 * Custom pipes: any OD and wall.
 */
import { DIAMETER_MM, requireWithin, WALL_MM } from '../limits.js';
import { makePipe, positive, trimmedNumber } from './make-pipe.js';
import type { Pipe } from './types.js';

/** Options of {@link pipeFromDimensions}. */
export interface PipeFromDimensionsOptions {
  /** The input field named in errors. Default `'pipe'`. */
  readonly field?: string;
}

/**
 * A custom pipe from its outside diameter and wall, both in millimetres.
 *
 * @param odMm outside diameter, mm, finite and > 0.
 * @param wallMm wall thickness, mm, finite, > 0 and < odMm / 2.
 * @param label the pipe's name; default `'<od> x <wall> mm'` (e.g. `406.4 x 9.53 mm`).
 * @returns a pipe with `standard: 'custom'` and `idMm = odMm - 2 wallMm`.
 * @throws GirthError (field = `options.field ?? 'pipe'`): `NOT_A_NUMBER`/`NOT_FINITE`
 *   for NaN or infinite values, `NEGATIVE` for values at or below zero,
 *   `OUT_OF_RANGE` for an OD or wall outside the limits (limits.ts),
 *   `WALL_TOO_THICK` for a wall of half the OD or more.
 * @example pipeFromDimensions(406.4, 9.53).label // '406.4 x 9.53 mm'
 */
export function pipeFromDimensions(odMm: number, wallMm: number, label?: string, options: PipeFromDimensionsOptions = {}): Pipe {
  const field = options.field ?? 'pipe';
  const given = typeof label === 'string' ? label.trim() : undefined;
  positive(odMm, field, 'OD', given || 'a custom pipe');
  positive(wallMm, field, 'wall', given || 'a custom pipe');
  requireWithin(odMm, field, { ...DIAMETER_MM, what: `the OD of ${given || 'a custom pipe'}` });
  requireWithin(wallMm, field, { ...WALL_MM, what: `the wall of ${given || 'a custom pipe'}` });
  const name = given !== undefined && given !== '' ? given : `${trimmedNumber(odMm)} x ${trimmedNumber(wallMm)} mm`;
  return makePipe({ odMm, wallMm, label: name, standard: 'custom' }, field);
}
