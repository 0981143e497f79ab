/**
 * Weld preparation of a branch joint: bevel of the branch cut, station by
 * station, and the torch for the header hole with the hole's line on the ID.
 */
import {
  findGrazingPhis,
  headerIdSurface,
  hitGenerator,
  holeTorchAtStation,
  resolveGroove,
  solveBranch,
  TANGENCY_REL_EPS,
  weldPrepWarnings,
  type BranchGeometry,
  type BranchSpec,
  type GeneratorHit,
  type GrooveSpec,
} from '@girth/geometry';
import type { Point2, Polyline2 } from '../types.js';
import { sampleCut } from '../wrap/sample-cut.js';
import type { BranchWeldPrep, HoleStationPrep, WeldPrepOptions } from './types.js';
import { prepStations, resolveWeldPrepStations, stationPhiRad } from './internal/weld-prep-stations.js';

/**
 * Weld preparation of a branch joint (conventions in `weld/types.ts` and
 * `bevelAtStation`): at each station of the branch cut the local dihedral
 * angle, the torch angle that makes the groove against the header (the branch
 * alone is beveled; land and wall from the branch), and where no bevel is
 * needed; for the header hole, the torch held parallel to the branch axis
 * (so the hole meets the branch bore) with its tilt from the header's radial,
 * and the hole's line on the header ID (girth measured on the ID), which a
 * set-in branch needs for fit-up. Warnings: dihedral angles below AWS D1.1's
 * prequalified range (recalled), a set-on branch turning into a tangent joint
 * at the sides of a near-equal tee, and stations where the groove cannot be
 * opened by beveling the branch.
 *
 * @param spec the branch joint, as for `layoutBranch` (its `gapMm` is the root gap).
 * @param groove `grooveAngleDeg` in (0, 90), `landMm` ≥ 0 and thinner than the branch wall.
 * @param options `stations` (4 to 360, default 16), `chordToleranceMm` of the ID outline.
 * @throws GirthError every error of `solveBranch`; those of `resolveGroove`
 *   (`OUT_OF_RANGE` on `grooveAngleDeg` or `landMm`, `NEGATIVE` on `landMm`);
 *   `OUT_OF_RANGE` on `stations`; `BAD_OPTION` when `options` is not an object.
 * @example
 * const prep = weldPrepForBranch({ header: { odMm: 323.85, wallMm: 9.525 }, branch: { odMm: 168.275, wallMm: 7.112 }, angleDeg: 45 }, { grooveAngleDeg: 45, landMm: 1.6 });
 * prep.stations[8]?.dihedralDeg // 45 at the toe
 */
export function weldPrepForBranch(spec: BranchSpec, groove: GrooveSpec, options: WeldPrepOptions = {}): BranchWeldPrep {
  const count = resolveWeldPrepStations(options);
  const g = solveBranch(spec);
  const resolved = resolveGroove(groove, g.spec.branch.wallMm);
  const stations = prepStations(g.cutBundle, g.cutHost, count, resolved, false);
  const idOutline = holeOnHeaderId(g, count, options.chordToleranceMm);
  const hole: HoleStationPrep[] = Array.from({ length: count }, (_, i) => {
    const torch = holeTorchAtStation(g, stationPhiRad(i, count));
    const id = idOutline?.stations[i];
    return {
      n: i + 1,
      angleDeg: (360 * i) / count,
      torchTiltDeg: torch.tiltDeg,
      leanAlongHeaderDeg: torch.leanAlongHeaderDeg,
      leanAroundHeaderDeg: torch.leanAroundHeaderDeg,
      ...(id === undefined ? {} : { idGirthMm: id[0], idAxialMm: id[1] }),
    };
  });
  return {
    kind: 'branch-weld-prep',
    groove: resolved,
    fit: g.spec.fit,
    stations,
    hole,
    ...(idOutline === undefined ? {} : { holeOnId: idOutline.outline }),
    warnings: weldPrepWarnings(
      stations.map((s) => ({ n: s.n, dihedralDeg: s.dihedralDeg, status: s.bevel })),
      { tubular: true, checkTangent: g.spec.fit === 'set-on' },
    ),
  };
}

/** The hole surface where it comes out in the header bore, developed on the ID; undefined when it is wider than the bore. */
function holeOnHeaderId(
  g: BranchGeometry,
  count: number,
  chordToleranceMm: number | undefined,
): { readonly stations: readonly Point2[]; readonly outline: Polyline2 } | undefined {
  const host = headerIdSurface(g);
  const r = g.holeBundle.radius;
  const e = g.spec.offsetMm;
  if (Math.abs(e) + r > host.radius * (1 + TANGENCY_REL_EPS)) return undefined;
  const flatten = (hit: GeneratorHit): Point2 => [host.radius * Math.atan2(hit.point[1], hit.point[2]), hit.point[0]];
  if (Array.from({ length: count }, (_, i) => hitGenerator(g.holeBundle, host, stationPhiRad(i, count))).some((h) => h === undefined)) return undefined;
  const cut = sampleCut(g.holeBundle, host, {
    stations: count,
    wrapOdMm: 2 * host.radius,
    chordToleranceMm,
    kinkPhisRad: findGrazingPhis(g.holeBundle, host),
    flatten,
    longPoints: false,
  });
  return {
    stations: cut.stations.map(flatten),
    outline: { points: cut.samples.slice(0, -1).map(flatten), closed: true },
  };
}
