/**
 * Weld preparation of a cut-back (a pipe end cut to meet a plane) and of a
 * miter elbow.
 */
import { GirthError } from '@girth/pipes';
import {
  miterGeometry,
  planeCutGeometry,
  resolveGroove,
  weldEndBevel,
  weldPrepWarnings,
  type GrooveSpec,
  type MiterSpec,
  type PlaneCutSpec,
} from '@girth/geometry';
import type { MiterWeldPrep, PlaneCutWeldPrep, WeldPrepOptions } from './types.js';
import { prepStations, resolveWeldPrepStations } from './internal/weld-prep-stations.js';

/**
 * Weld preparation of a pipe end cut to meet a plane: at each station the
 * local dihedral angle between the pipe's outside and the plane (the angle of
 * the cut at the heel, its supplement on the far side), and the torch angle
 * that makes the groove against the plane (the pipe alone is beveled).
 * Warnings as for a branch (the cut-back is a tubular T- or Y-connection to
 * the surface), without the tangent-joint check.
 *
 * @param spec the cut, as for `layoutPlaneCut` (its `gapMm` is the root gap).
 * @param groove `grooveAngleDeg` in (0, 90), `landMm` ≥ 0 and thinner than the wall.
 * @throws GirthError every error of `planeCutGeometry`; those of
 *   `resolveGroove`; `OUT_OF_RANGE` on `stations`.
 * @example weldPrepForPlaneCut({ pipe: { odMm: 168.3, wallMm: 7.11 }, angleDeg: 60 }, { grooveAngleDeg: 45 }).stations[0]?.dihedralDeg // 60
 */
export function weldPrepForPlaneCut(spec: PlaneCutSpec, groove: GrooveSpec, options: WeldPrepOptions = {}): PlaneCutWeldPrep {
  const count = resolveWeldPrepStations(options);
  const g = planeCutGeometry(spec);
  const resolved = resolveGroove(groove, g.pipe.wallMm);
  const stations = prepStations(g.bundle, g.host, count, resolved, false);
  return {
    kind: 'plane-cut-weld-prep',
    groove: resolved,
    stations,
    warnings: weldPrepWarnings(
      stations.map((s) => ({ n: s.n, dihedralDeg: s.dihedralDeg, status: s.bevel })),
      { tubular: true, checkTangent: false },
    ),
  };
}

/**
 * Weld preparation of a miter elbow: every weld alike. At each station of a
 * piece end (station 1 on the throat) the dihedral angle between the two
 * pieces' outsides (180 − 2c at the throat, 180 + 2c on the back, c the cut
 * angle) and the torch angle of each piece's bevel, each piece taking half the
 * groove's included angle against the weld plane. A square cut's 37.5° B16.25
 * bevel is the case c = 0 with a 75° groove. The elbow's two square ends get
 * the ASME B16.25 weld end for the wall (recalled).
 *
 * @param spec the elbow, as for `layoutMiter`.
 * @param groove included angle `grooveAngleDeg` in (0, 90), `landMm` ≥ 0 and thinner than the wall.
 * @throws GirthError every error of `miterGeometry`; those of `resolveGroove`;
 *   `OUT_OF_RANGE` on `stations`.
 * @example weldPrepForMiter({ pipe: { odMm: 323.9, wallMm: 9.53 }, bendDeg: 90, welds: 3, radiusMm: 457.2 }, { grooveAngleDeg: 75, landMm: 1.6 }).stations[0]?.torchDeg // 37.5 + 15
 */
export function weldPrepForMiter(spec: MiterSpec, groove: GrooveSpec, options: WeldPrepOptions = {}): MiterWeldPrep {
  const count = resolveWeldPrepStations(options);
  const g = miterGeometry(spec);
  const resolved = resolveGroove(groove, g.spec.pipe.wallMm);
  const cutEnd = g.pieces[0]?.farCut;
  if (cutEnd === undefined) throw new GirthError('EMPTY_INPUT', 'welds', 'welds: a miter elbow needs at least one weld');
  const stations = prepStations(cutEnd.bundle, cutEnd.host, count, resolved, true);
  return {
    kind: 'miter-weld-prep',
    groove: resolved,
    stations,
    squareEnds: weldEndBevel(g.spec.pipe.wallMm),
    warnings: weldPrepWarnings(
      stations.map((s) => ({ n: s.n, dihedralDeg: s.dihedralDeg, status: s.bevel })),
      { tubular: false, checkTangent: false },
    ),
  };
}
