/**
 * The pipe every joint is laid out on (a branch, its header, a plane-cut or
 * miter pipe), as given and as checked. Structural, so the pipes package's
 * `Pipe` fits it as it is. One resolver checks it for every joint.
 */
import { formatLengthBoth, GirthError, requirePositive } from '@girth/pipes';

/**
 * A pipe as a joint needs it. Lengths in mm.
 * `npsIn` is the nominal size in inches (1.5 for NPS 1-1/2); only needed when a
 * radius is given as a multiple of the nominal size (miters).
 */
export interface PipeSection {
  /** Outside diameter, mm, > 0. */
  readonly odMm: number;
  /** Wall thickness, mm, > 0 and below half the OD. */
  readonly wallMm: number;
  /** How the pipe is named on templates, e.g. `NPS 8 STD`. */
  readonly label?: string;
  /** Nominal pipe size, inches (e.g. 1.5 for NPS 1-1/2), > 0. */
  readonly npsIn?: number;
}

/** A checked pipe: OD, wall and ID in mm, the label used on templates, and the nominal size when given. */
export interface ResolvedPipeSection {
  readonly kind: 'pipe-section';
  readonly odMm: number;
  readonly wallMm: number;
  /** OD − 2 × wall, mm. */
  readonly idMm: number;
  /** The given label, or one made from the OD and wall in mm. */
  readonly label: string;
  /** Nominal pipe size, inches, when given. */
  readonly npsIn?: number;
}

/**
 * Checks a pipe given to a joint and fills in its ID and label. Errors name
 * the field under `field`: `pipe.odMm`, `header.wallMm`, ...
 *
 * @param pipe the pipe as given (any value: it is checked).
 * @param field the input field for error messages, default `pipe`
 *   (`header` and `branch` for a branch joint).
 * @throws GirthError `EMPTY_INPUT` when no pipe is given; `NOT_A_NUMBER`,
 *   `NOT_FINITE` or `NEGATIVE` for an OD, wall or nominal size that is not a
 *   number, not finite, or not above 0; `WALL_TOO_THICK` when the wall is half
 *   the OD or more (no bore left; the message gives the limit); `BAD_OPTION`
 *   for a label that is not text.
 * @example resolvePipeSection({ odMm: 219.1, wallMm: 8.18 }).idMm // 202.74
 * @example resolvePipeSection({ odMm: 100, wallMm: 50 }, 'branch') // throws WALL_TOO_THICK on branch.wallMm
 */
export function resolvePipeSection(pipe: PipeSection, field = 'pipe'): ResolvedPipeSection {
  if (pipe === null || typeof pipe !== 'object') {
    throw new GirthError('EMPTY_INPUT', field, `${field}: give the pipe's OD and wall`, pipe);
  }
  const odMm = requirePositive(pipe.odMm, `${field}.odMm`);
  const wallMm = requirePositive(pipe.wallMm, `${field}.wallMm`);
  if (wallMm * 2 >= odMm) {
    throw new GirthError(
      'WALL_TOO_THICK',
      `${field}.wallMm`,
      `${field}.wallMm: a wall of ${formatLengthBoth(wallMm)} leaves no bore in OD ${formatLengthBoth(odMm)}; the wall must be less than ${formatLengthBoth(odMm / 2)}`,
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
