/**
 * Maps points of miter templates back onto the assembled elbow in 3D, using
 * only the template's own numbers, the piece frames of `miterGeometry` and the
 * cut list, so tests can compare the cut lines of neighbouring pieces.
 */
import { addScaled, type MiterGeometry, type MiterPiece3d, type Vec3 } from '@girth/geometry';
import type { Point2 } from '../../types.js';

/** Which end of the piece a template point belongs to. */
export type PieceEnd = 'near' | 'far';

/**
 * The 3D point of template point (x, y) on piece `index` of the elbow.
 *
 * - End template (`miter-end`, y from the square line through the long point):
 *   the point lies `endBack − y` from the piece's square end along the piece;
 *   on the first piece the cut is its far end, on the last its near end.
 * - Middle template (`miter-middle`): y runs from the near square line, and
 *   the piece's middle (its tangent point) is at y = middleBack / 2.
 *
 * Station angle phi = x / (wrapOd / 2); the point is on the fit surface of
 * radius `fitRadiusMm`, at cos phi toward the throat and sin phi along +z.
 */
export function templatePointTo3d(
  g: MiterGeometry,
  index: number,
  p: Point2,
  backs: { readonly endBack: number; readonly middleBack?: number },
): Vec3 {
  const piece = g.pieces[index] as MiterPiece3d;
  const phi = p[0] / (g.spec.pipe.odMm / 2);
  const r = g.spec.fitRadiusMm;
  const onCircle = (base: Vec3): Vec3 =>
    addScaled(addScaled(base, piece.heelDirection, r * Math.cos(phi)), piece.sideDirection, r * Math.sin(phi));
  if (piece.role === 'end') {
    const square = piece.squareEndCenter as Vec3;
    const inward = index === 0 ? 1 : -1; // from the square end toward the cut
    return onCircle(addScaled(square, piece.direction, inward * (backs.endBack - p[1])));
  }
  const middleBack = backs.middleBack as number;
  return onCircle(addScaled(piece.tangentPoint, piece.direction, p[1] - middleBack / 2));
}
