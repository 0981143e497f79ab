/**
 * Fit-up of a branch on its header: where to mark the header, how to check
 * the branch angle with a tape and square, and the offset.
 */
import { GirthError } from '@girth/pipes';
import { hitGenerator, solveBranch, type BranchGeometry, type BranchSpec, type GeneratorBundle } from '@girth/geometry';
import { angleCheck, type AngleCheck, type AngleCheckOptions } from './angle-check.js';
import { measureCutDepth, type CutDepth } from './cut-depth.js';

/** A point marked on the header OD, on the line through the branch centre (the top line, or the offset line). Lengths in mm. */
export interface HeaderMark {
  /** Distance along the header line from where the branch centreline crosses the header OD, mm, ≥ 0 (toward the heel end for a heel mark, the toe end for a toe mark). */
  readonly fromCentreMm: number;
  /** Axial position along the header from where the branch axis crosses the header axis (as in the `header-hole` table), mm, signed. */
  readonly axialMm: number;
  /** Girth round the header OD from its top line (as in the `header-hole` table), mm, signed. */
  readonly girthMm: number;
}

/** The heel and toe marks of one outline on the header. */
export interface HeelToeMarks {
  readonly heel: HeaderMark;
  readonly toe: HeaderMark;
}

/** The offset of an offset branch, measured on the header OD. Lengths in mm, signed like the offset (+ toward +y). */
export interface HeaderOffset {
  /** The offset as given: branch axis from the header axis, square to both, mm. */
  readonly offsetMm: number;
  /** Round the header OD from the top line to the offset line (where the branch centreline meets the header), mm: a tape laid on the pipe. */
  readonly girthFromTopLineMm: number;
  /** Straight across from the top line to the branch centreline at the header OD, mm. */
  readonly chordFromTopLineMm: number;
}

/** Options of {@link branchFitUp}: the lengths of the angle check. */
export type BranchFitUpOptions = AngleCheckOptions;

/** The fit-up dimensions of a branch joint. Lengths in mm, angles in degrees. */
export interface BranchFitUp {
  readonly kind: 'branch-fit-up';
  /** `top-line` for a centred branch; `offset-line` (the header generator through the branch centreline's crossing) for an offset one. */
  readonly markLine: 'top-line' | 'offset-line';
  /** Where the branch centreline crosses the header OD: girth from the top line, axial from where the axes cross, mm. */
  readonly centre: { readonly girthMm: number; readonly axialMm: number };
  /** Heel and toe of the hole (the branch surface that outlines it, on the header OD). */
  readonly hole: HeelToeMarks;
  /** Heel and toe of the weld: where the branch OD meets the header OD (the outside edge of the joint before the weld is laid). */
  readonly weld: HeelToeMarks;
  /** Present for an offset branch. */
  readonly offset?: HeaderOffset;
  /** Check of the angle between the branch centreline and the header line, from the crossing point. */
  readonly angleCheck: AngleCheck;
  /** Depth of the branch cut (long point to short point), for `ordinatesFrom` on the `branch-cut` template. */
  readonly cutDepths: readonly CutDepth[];
}

/**
 * Fit-up dimensions of a branch on its header (DESIGN.md conventions): the
 * point where the branch centreline crosses the header OD; along the line of
 * the header through that point (its top line, or the offset line for an
 * offset branch), the distances from it to the heel and toe points of the
 * hole and of the weld (each ρ / sin A for a surface of radius ρ: the heel and
 * toe generators lie in the plane of the offset line); the offset round the
 * header and straight across; the tape-and-square check of the angle; and the
 * depth of the branch cut.
 *
 * @throws GirthError every error of `solveBranch`; those of `angleCheck` for
 *   the options (`runMm`, `chordRadiusMm`, `arcUnitMm`).
 * @example
 * branchFitUp({ header: { odMm: 323.85, wallMm: 9.525 }, branch: { odMm: 168.275, wallMm: 7.112 }, angleDeg: 45 }).hole.toe.fromCentreMm
 * // 77.025 / sin 45° ≈ 108.93
 */
export function branchFitUp(spec: BranchSpec, options: BranchFitUpOptions = {}): BranchFitUp {
  const g = solveBranch(spec);
  const check = angleCheck(g.spec.angleDeg, options);
  return fitUpOfGeometry(g, check);
}

function fitUpOfGeometry(g: BranchGeometry, check: AngleCheck): BranchFitUp {
  const s = g.spec;
  const R = s.header.odMm / 2;
  const e = s.offsetMm;
  const zc = Math.sqrt(Math.max(0, R * R - e * e));
  const b = g.branchAxisDirection;
  const centre = { girthMm: R * Math.atan2(e, zc), axialMm: (zc * b[0]) / b[2] };
  const marks = (bundle: GeneratorBundle): HeelToeMarks => {
    const mark = (phiRad: number, sign: 1 | -1): HeaderMark => {
      const hit = hitGenerator(bundle, g.holeHost, phiRad);
      if (hit === undefined) throw new GirthError('NO_INTERSECTION', 'offsetMm', 'offsetMm: the branch misses the header at its heel or toe');
      const axialMm = hit.point[0];
      return { fromCentreMm: sign * (axialMm - centre.axialMm), axialMm, girthMm: R * Math.atan2(hit.point[1], hit.point[2]) };
    };
    return { heel: mark(0, -1), toe: mark(Math.PI, 1) };
  };
  const weldBundle: GeneratorBundle = { ...g.holeBundle, radius: s.branch.odMm / 2 };
  return {
    kind: 'branch-fit-up',
    markLine: e === 0 ? 'top-line' : 'offset-line',
    centre,
    hole: marks(g.holeBundle),
    weld: marks(weldBundle),
    ...(e === 0 ? {} : { offset: { offsetMm: e, girthFromTopLineMm: centre.girthMm, chordFromTopLineMm: Math.sign(e) * Math.hypot(e, R - zc) } }),
    angleCheck: check,
    cutDepths: [measureCutDepth(g.cutBundle, g.cutHost, { templateId: 'branch-cut', kinkPhisRad: g.cutKinkPhisRad })],
  };
}
