/**
 * The bevel rule: torch angle from the local dihedral angle and the groove.
 */
import type { ResolvedGroove, StationBevel } from './types.js';

const RAD = Math.PI / 180;

/**
 * The bevel of one station.
 *
 * Rule, in the plane square to the cut line at the station: the cut pipe's
 * outside surface and the host's meet at the local dihedral angle ψ. A wall
 * cut radially (square to the pipe surface, the way templates are cut) has its
 * end face along the pipe's radial direction, 90° from the pipe surface, so it
 * leaves a groove of ψ − 90° against the host. To make a groove of G the
 * bevel face must lie at G from the host surface, that is at
 * torch = G + 90° − ψ from the radial direction, leaning back along the pipe
 * body. Then:
 * - torch ≤ 0: the joint already opens the groove (`open`, no bevel);
 * - torch ≥ 90° (ψ ≤ G): the bevel face would have to lie along the wall or
 *   beyond it (`closed`: prepare the host too, or use another detail);
 * - otherwise `bevel` at torch, reaching (wall − land) · tan(torch) back
 *   from the cut line along the outside.
 *
 * @param dihedralDeg local dihedral angle ψ of this pipe against the surface
 *   its groove faces, degrees in [0, 180].
 * @param grooveDeg the groove this pipe's bevel must make with that surface,
 *   degrees in (0, 90) (half the included angle for each piece of a miter).
 * @param groove the checked groove (land and wall).
 * @example bevelAtStation(90, 45, groove).torchDeg // 45 at the crown of a tee
 */
export function bevelAtStation(dihedralDeg: number, grooveDeg: number, groove: ResolvedGroove): StationBevel {
  const openingDeg = dihedralDeg - 90;
  const torchDeg = grooveDeg - openingDeg;
  if (torchDeg <= 0) return { status: 'open', torchDeg: 0, bevelWidthMm: 0, openingDeg };
  if (torchDeg >= 90) return { status: 'closed', openingDeg };
  return {
    status: 'bevel',
    torchDeg,
    bevelWidthMm: (groove.wallMm - groove.landMm) * Math.tan(torchDeg * RAD),
    openingDeg,
  };
}
