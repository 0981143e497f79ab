/**
 * The straight pipe that a plane cut or a miter is laid out on, as given and as
 * checked. Structural, so the pipes package's `Pipe` fits it as it is.
 */
import { GirthError, requirePositive } from '@girth/pipes';

/**
 * A straight pipe as a cut needs it. Lengths in mm.
 * `npsIn` is the nominal size in inches (1.5 for NPS 1-1/2); only needed when a
 * radius is given as a multiple of the nominal size.
 */
export interface PipeSectionInput {
  /** Outside diameter, mm, > 0. */
  readonly odMm: number;
  /** Wall thickness, mm, > 0 and below half the OD. */
  readonly wallMm: number;
  /** How the pipe is named on templates, e.g. `NPS 8 STD`. */
  readonly label?: string;
  /** Nominal pipe size, inches (e.g. 1.5 for NPS 1-1/2), > 0. */
  readonly npsIn?: number;
}

/** A checked pipe: OD, wall and ID in mm, and the label used on templates. */
export interface ResolvedPipeSection {
  readonly kind: 'pipe-section';
  readonly odMm: number;
  readonly wallMm: number;
  /** OD − 2 × wall, mm. */
  readonly idMm: number;
  /** The given label, or one made from the OD and wall in mm. */
  readonly label: string;
  readonly npsIn?: number;
}

/**
 * Checks a pipe given to a cut layout and fills in its ID and label.
 *
 * @param pipe the pipe as given (any value: it is checked).
 * @param field the input field for error messages, default `pipe`.
 * @throws GirthError `EMPTY_INPUT` when no pipe is given; `NOT_A_NUMBER`,
 *   `NOT_FINITE` or `NEGATIVE` for a bad OD, wall or nominal size;
 *   `WALL_TOO_THICK` when the wall is half the OD or more; `BAD_OPTION` for a
 *   label that is not text.
 * @example resolvePipeSection({ odMm: 219.1, wallMm: 8.18 }).idMm // 202.74
 */
export function resolvePipeSection(pipe: PipeSectionInput, field = 'pipe'): ResolvedPipeSection {
  if (pipe === null || typeof pipe !== 'object') {
    throw new GirthError('EMPTY_INPUT', field, `${field}: give the pipe's OD and wall`, pipe);
  }
  const odMm = requirePositive(pipe.odMm, `${field}.odMm`);
  const wallMm = requirePositive(pipe.wallMm, `${field}.wallMm`);
  if (wallMm * 2 >= odMm) {
    throw new GirthError(
      'WALL_TOO_THICK',
      `${field}.wallMm`,
      `${field}.wallMm: a wall of ${wallMm} mm leaves no bore in a pipe of ${odMm} mm OD (the wall must be less than ${odMm / 2} mm)`,
      pipe.wallMm,
    );
  }
  if (pipe.label !== undefined && typeof pipe.label !== 'string') {
    throw new GirthError('BAD_OPTION', `${field}.label`, `${field}.label: expected text`, pipe.label);
  }
  const npsIn = pipe.npsIn === undefined ? undefined : requirePositive(pipe.npsIn, `${field}.npsIn`);
  const label = pipe.label !== undefined && pipe.label.trim() !== '' ? pipe.label : `${odMm} mm OD x ${wallMm} mm wall`;
  return {
    kind: 'pipe-section',
    odMm,
    wallMm,
    idMm: odMm - 2 * wallMm,
    label,
    ...(npsIn === undefined ? {} : { npsIn }),
  };
}
