/**
 * A joint as a fitter writes it — on the command line or in a job file: pipe
 * names and lengths as text, angles as numbers. One shape for both, so the
 * flags and the job file go through the same checks and the same layout.
 */
import type { LengthUnit } from '@girth/pipes';
import type { DescribeOptions } from '@girth/unroll';

/** A length as written: text such as `2 1/2"` or `63.5mm`, or a bare number in the job's unit. */
export type WrittenLength = string | number;

/** A branch on a header: tee or lateral, centred or offset. */
export interface BranchInput {
  readonly joint: 'branch';
  readonly header: string;
  readonly branch: string;
  readonly angle?: number;
  readonly offset?: WrittenLength;
  readonly fit?: 'set-on' | 'set-in';
  readonly gap?: WrittenLength;
  /** Override which branch surface meets which header surface. */
  readonly branchSurface?: 'inside' | 'outside';
  readonly headerSurface?: 'inside' | 'outside';
}

/** A segmented (miter) elbow. */
export interface MiterInput {
  readonly joint: 'miter';
  readonly pipe: string;
  readonly bend: number;
  readonly welds?: number;
  readonly pieces?: number;
  readonly radius?: WrittenLength;
  readonly radiusNps?: number;
  readonly tangent?: WrittenLength;
  readonly surface?: 'od' | 'id';
}

/** A pipe end cut to meet a plane. */
export interface CutbackInput {
  readonly joint: 'cutback';
  readonly pipe: string;
  readonly angle: number;
  readonly gap?: WrittenLength;
  readonly surface?: 'od' | 'id';
}

/** A cone reducer rolled from plate. */
export interface ReducerInput {
  readonly joint: 'reducer';
  readonly large: string;
  readonly small: string;
  readonly length?: WrittenLength;
  readonly includedAngle?: number;
  readonly plate: WrittenLength;
  readonly eccentric?: boolean;
  readonly seam?: 'flat-side' | 'opposite';
  readonly diameters?: 'outside' | 'inside' | 'mean';
  readonly segments?: number;
}

/** Any joint Girth lays out. */
export type JointInput = BranchInput | MiterInput | CutbackInput | ReducerInput;

/** Settings shared by every joint of a run. */
export interface JointContext {
  /** Unit of bare numbers and of the output. */
  readonly units: LengthUnit;
  /** Stations around the girth, 4..360. */
  readonly stations: number;
  /** Prefix for field names in errors, e.g. `pieces[2].` in a job file or `--` on the command line. */
  readonly fieldPrefix: string;
  /** How a field is named in errors: `--header` on the command line, `pieces[2].header` in a job. */
  readonly fieldName: (name: string) => string;
  /** How the templates' titles and notes word lengths: the job's unit first, in its style. */
  readonly describe: DescribeOptions;
}
