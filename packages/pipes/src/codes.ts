/**
 * The documented list of error codes: one per kind of mistake, whichever layer
 * finds it and whether the value came from a library call, a command-line
 * option or a job file. The field (`--angle`, `pieces[2].angle`, `angleDeg`)
 * says where; the code says what kind of mistake it is.
 */
import type { GirthErrorCode } from './errors.js';

/**
 * What each {@link GirthErrorCode} means. Programs may rely on the codes; the
 * messages are for people and may be reworded.
 *
 * Renamed codes (each kind of mistake had two): `BAD_ANGLE` (a branch angle
 * outside 1..90°) is now `OUT_OF_RANGE` like every other number outside its
 * bounds; a missing required option or job key is `MISSING_INPUT` (was
 * `BAD_OPTION` on the command line, `BAD_JOB` in a job file); a word that is
 * not one of the allowed ones is `BAD_CHOICE` (was `BAD_OPTION`/`BAD_JOB`; in
 * the library too: `fit`, contact surfaces, `fitSurface`, `diametersAt`,
 * `seam`); a
 * job-file number outside its bounds is `OUT_OF_RANGE` and a job-file value
 * that should be a number is `NOT_A_NUMBER` (were `BAD_JOB`).
 *
 * @example ERROR_CODES.OUT_OF_RANGE // 'a number outside its limits ...'
 */
export const ERROR_CODES: Readonly<Record<GirthErrorCode, string>> = {
  EMPTY_INPUT: 'a text field (pipe name, length) given but blank',
  MISSING_INPUT: 'a required option or job-file key left out',
  NOT_A_NUMBER: 'a value that should be a number is not one (text, NaN)',
  NOT_FINITE: 'a number that is infinite',
  NEGATIVE: 'a length or size at or below zero where it must be above zero (or below zero where it must not be negative)',
  OUT_OF_RANGE: 'a number outside its limits (limits.ts): stations, angles, bend, diameters, wall, plate, welds, chord tolerance',
  DIVIDE_BY_ZERO: 'a written fraction with a zero denominator (1/0)',
  UNKNOWN_UNIT: 'a length with a unit Girth does not know',
  BAD_LENGTH: 'text that is not a length as a fitter writes one',
  BAD_PIPE_NAME: 'text that is not a pipe name (NPS, DN or OD x wall)',
  UNKNOWN_SIZE: 'a pipe size not in the standard named',
  UNKNOWN_SCHEDULE: 'a schedule or weight class not listed for that size',
  MISSING_SCHEDULE: 'a pipe size given without its schedule or wall',
  WALL_TOO_THICK: 'a wall or plate that leaves no bore (half the diameter or more)',
  BRANCH_TOO_LARGE: 'a branch that does not fit on its header',
  OFFSET_MISSES: 'a branch offset that takes the branch off the header',
  NOZZLE_OFF_HEAD: 'a nozzle placed or sized so its hole runs off the dished part of the head (past the knuckle onto the straight flange)',
  TRUNNION_OFF_ELBOW: 'a branch or trunnion on an elbow placed or sized so its hole runs off the bend onto the straight ends',
  PAD_SIZE: 'a reinforcing pad whose ring width or outside size does not clear the branch hole, or that would wrap right round its header',
  HOLES_OVERLAP: 'two branch holes in one header or shell plate that run into each other (naming the later branch)',
  NO_INTERSECTION: 'pieces that do not meet as placed',
  BAD_CHOICE: 'a word that is not one of the allowed ones (--fit, --surface, units, outputs; fit, fitSurface, diametersAt, seam in library calls)',
  BAD_TEXT: 'a label with control characters or too long to print',
  BAD_OPTION: 'a command-line option that does not exist, is given twice, lacks its value, or does nothing with the others given; options of a library call that cannot go together',
  BAD_JOB: 'a job file that cannot be read, is not JSON, or has a key a job or piece does not take',
  CANNOT_READ: 'a file that cannot be read (missing, no permission, a FIFO, too large), naming the option or path',
  CANNOT_WRITE: 'a file or folder that cannot be written (read-only, no permission, disk full, name too long), naming the option and path',
};
