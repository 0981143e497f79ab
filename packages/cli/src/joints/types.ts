/**
 * A joint as a fitter writes it — on the command line or in a job file: pipe
 * names and lengths as text, angles as numbers. One shape for both, so the
 * flags and the job file go through the same checks and the same layout. Each
 * joint's own input is declared in its definition file (`branch.ts`, ...).
 */
import type { LengthUnit } from '@girth/pipes';
import type { DescribeOptions } from '@girth/unroll';

export type { BranchInput } from './branch.js';
export type { CutbackInput } from './cutback.js';
export type { MiterInput } from './miter.js';
export type { ReducerInput } from './reducer.js';
export type { JointInput } from './registry.js';

/** A length as written: text such as `2 1/2"` or `63.5mm`, or a bare number in the job's unit. */
export type WrittenLength = string | number;

/** Settings shared by every joint of a run. */
export interface JointContext {
  /** Unit of bare numbers and of the output. */
  readonly units: LengthUnit;
  /** Stations around the girth (limits.ts `STATIONS`: 4 to 360). */
  readonly stations: number;
  /** Prefix for field names in errors, e.g. `pieces[2].` in a job file or `--` on the command line. */
  readonly fieldPrefix: string;
  /** How a field is named in errors: `--header` on the command line, `pieces[2].header` in a job. */
  readonly fieldName: (name: string) => string;
  /** How the templates' titles and notes word lengths: the job's unit first, in its style. */
  readonly describe: DescribeOptions;
}
