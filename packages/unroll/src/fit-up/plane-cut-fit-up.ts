/**
 * Fit-up of a pipe end cut to meet a plane (a cut-back): the angle check and
 * where the pipe's centreline meets the cut, from either square line.
 */
import { planeCutGeometry, type PlaneCutSpec } from '@girth/geometry';
import { hitGenerator } from '@girth/geometry';
import { GirthError } from '@girth/pipes';
import { angleCheck, type AngleCheck, type AngleCheckOptions } from './angle-check.js';
import { locateCutExtremes, measureCutDepth, type CutDepth } from './cut-depth.js';

/** Options of {@link planeCutFitUp}: the lengths of the angle check. */
export type PlaneCutFitUpOptions = AngleCheckOptions;

/** Fit-up dimensions of a plane cut. Lengths in mm. */
export interface PlaneCutFitUp {
  readonly kind: 'plane-cut-fit-up';
  /** Check of the angle between the pipe axis and the plane (vertex where the axis meets the plane). */
  readonly angleCheck: AngleCheck;
  /** From the square line through the long point back to where the pipe's centreline meets the cut, mm. */
  readonly centreFromLongPointMm: number;
  /** From the square line through the short point forward to the same point, mm. */
  readonly centreFromShortPointMm: number;
  /** Depth of the `plane-cut` template's cut, for `ordinatesFrom`. */
  readonly cutDepths: readonly CutDepth[];
}

/**
 * Fit-up dimensions of a plane cut: the tape-and-square check of the angle
 * between the pipe axis and the plane, where the centreline meets the cut
 * measured from each square line (the two add up to the full depth), and the
 * depth of the cut.
 *
 * @throws GirthError as `planeCutGeometry` (bad spec); those of `angleCheck` for the options.
 * @example planeCutFitUp({ pipe: { odMm: 168.3, wallMm: 7.11 }, angleDeg: 60 }).angleCheck.angleDeg // 60
 */
export function planeCutFitUp(spec: PlaneCutSpec, options: PlaneCutFitUpOptions = {}): PlaneCutFitUp {
  const g = planeCutGeometry(spec);
  const check = angleCheck(g.angleDeg, options);
  const { long, short } = locateCutExtremes(g.bundle, g.host);
  const axis = hitGenerator({ ...g.bundle, radius: 0 }, g.host, 0);
  if (axis === undefined) throw new GirthError('NO_INTERSECTION', 'angleDeg', 'angleDeg: the pipe does not meet the plane');
  return {
    kind: 'plane-cut-fit-up',
    angleCheck: check,
    centreFromLongPointMm: long.value - axis.axialMm,
    centreFromShortPointMm: axis.axialMm - short.value,
    cutDepths: [measureCutDepth(g.bundle, g.host, { templateId: 'plane-cut' })],
  };
}
