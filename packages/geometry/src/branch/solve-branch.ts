/**
 * A branch joint in 3D: which surfaces meet, the generator lines of the cut
 * and of the hole, and the kinks.
 */
import { GirthError, formatLengthBoth } from '@girth/pipes';
import { TANGENCY_REL_EPS } from '../tolerances.js';
import { offsetSurface } from '../surfaces/line-intersection.js';
import { findGrazingPhis } from '../surfaces/grazing.js';
import type { CylinderSurface } from '../types.js';
import { branchAxisDirection, branchBundle } from './branch-frame.js';
import { branchWarnings } from './branch-warnings.js';
import { resolveBranchSpec } from './resolve-branch-spec.js';
import type { BranchGeometry, BranchPipeSection, BranchSpec, PipeFace, ResolvedBranchSpec } from './types.js';

/**
 * Slack allowed past the tangent case, relative to the host radius: a branch
 * side flush with the header side whose sizes carry rounding still counts as
 * flush. A quarter of the grazing tolerance, so its generator still grazes.
 */
const FLUSH_REL_SLACK = TANGENCY_REL_EPS / 4;

/**
 * Solves a branch joint (DESIGN.md conventions): header axis along x, branch
 * axis at `angleDeg` to it in the x-z plane coming from +z, offset along +y;
 * phi = 0 at the heel (obtuse side), 180° at the toe, growing toward +y.
 *
 * Which surfaces meet: set-on cuts the branch ID to the header OD; set-in cuts
 * the branch OD to the header ID (the branch reaching the bore all round);
 * `spec.contact` overrides both. A root gap g moves the cut back along each
 * generator so the gap square to the header surface is g: the cut meets the
 * header surface offset by g toward the branch. The hole is the contacting
 * branch surface (ID for set-on, OD for set-in) on the header OD.
 *
 * A branch side flush with the header side (|offset| + r = R) is allowed: its
 * grazing generators are kinks, listed by `findGrazingPhis` (closed form for
 * a cylinder host).
 *
 * @throws GirthError every error of {@link resolveBranchSpec}, and
 *   `BRANCH_TOO_LARGE` (field `branch`) when the contacting branch surface is
 *   wider than the header surface it meets or than the header OD;
 *   `OFFSET_MISSES` (field `offsetMm`) when the offset takes part of the
 *   branch past the side of the header.
 * @example
 * const g = solveBranch({ header: { odMm: 323.85, wallMm: 9.525 }, branch: { odMm: 168.275, wallMm: 7.112 }, angleDeg: 45 });
 * g.cutBundle.radius // 77.025 (the branch ID radius, set-on)
 */
export function solveBranch(spec: BranchSpec): BranchGeometry {
  const s = resolveBranchSpec(spec);
  const angleRad = (s.angleDeg * Math.PI) / 180;
  const cutRadiusMm = faceRadius(s.branch, s.contact.branch);
  const headerFace: CylinderSurface = {
    kind: 'cylinder',
    radius: faceRadius(s.header, s.contact.header),
    axisPoint: [0, 0, 0],
    axisDirection: [1, 0, 0],
  };
  const cutHost = offsetSurface(headerFace, s.gapMm);
  const cutHostRadiusMm = headerFace.radius + s.gapMm;
  const headerOdRadiusMm = s.header.odMm / 2;

  checkFits(s, cutRadiusMm, cutHostRadiusMm, s.contact.header, s.gapMm);
  if (s.contact.header !== 'outside' || s.gapMm > 0) checkFits(s, cutRadiusMm, headerOdRadiusMm, 'outside', 0);

  const bundle = branchBundle(angleRad, s.offsetMm, cutRadiusMm);
  // The header OD, developed from its top line (+z), girth growing toward +y.
  const holeHost: CylinderSurface = {
    kind: 'cylinder',
    radius: headerOdRadiusMm,
    axisPoint: [0, 0, 0],
    axisDirection: [1, 0, 0],
    zeroGirthDirection: [0, 0, 1],
  };
  return {
    kind: 'branch-geometry',
    spec: s,
    angleRad,
    branchAxisDirection: branchAxisDirection(angleRad),
    cutRadiusMm,
    cutBundle: bundle,
    cutHost,
    cutKinkPhisRad: findGrazingPhis(bundle, cutHost),
    holeBundle: bundle,
    holeHost,
    holeKinkPhisRad: findGrazingPhis(bundle, holeHost),
    warnings: branchWarnings(s),
  };
}

function faceRadius(pipe: BranchPipeSection, face: PipeFace): number {
  return (face === 'inside' ? pipe.idMm : pipe.odMm) / 2;
}

/** Throws unless a branch surface of radius `r` fits on a header surface of radius `hostR` at the spec's offset. */
function checkFits(s: ResolvedBranchSpec, r: number, hostR: number, headerFace: PipeFace, gapMm: number): void {
  const slack = FLUSH_REL_SLACK * hostR;
  const branchName = `branch ${s.contact.branch === 'inside' ? 'ID' : 'OD'} ${formatLengthBoth(2 * r)}`;
  const hostName =
    `header ${headerFace === 'inside' ? 'ID' : 'OD'}` +
    (gapMm > 0 ? ` plus twice the root gap, ${formatLengthBoth(2 * hostR)}` : ` ${formatLengthBoth(2 * hostR)}`);
  if (r > hostR + slack) {
    throw new GirthError('BRANCH_TOO_LARGE', 'branch', `branch: ${branchName} is larger than ${hostName}`, s.branch.odMm);
  }
  const e = s.offsetMm;
  if (Math.abs(e) + r > hostR + slack) {
    throw new GirthError(
      'OFFSET_MISSES',
      'offsetMm',
      `offsetMm: an offset of ${formatLengthBoth(e)} takes the ${branchName} past the side of the ${hostName}; ` +
        `the offset may be at most ${formatLengthBoth(hostR - r)} (branch side flush with header side)`,
      e,
    );
  }
}
