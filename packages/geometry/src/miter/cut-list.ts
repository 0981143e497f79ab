/**
 * The cut list of a miter elbow, measured on its 3D pieces: lengths of each
 * kind of piece and the order of cuts from one straight length.
 */
import { GirthError } from '@girth/pipes';
import { hitGenerator } from '../generators.js';
import type { MiterCutEnd, MiterCutList, MiterGeometry, MiterPiece3d, MiterPieceCut, MiterStockCut } from './types.js';

/**
 * Axial position (mm, from the piece's tangent point toward the weld plane)
 * where the generator at `phiRad` of a cut end meets its weld plane; `axis`
 * takes the centreline instead (a generator of radius 0).
 */
function axialAt(cut: MiterCutEnd, phiRad: number | 'axis'): number {
  const bundle = phiRad === 'axis' ? { ...cut.bundle, radius: 0 } : cut.bundle;
  const hit = hitGenerator(bundle, cut.host, phiRad === 'axis' ? 0 : phiRad);
  if (hit === undefined) {
    throw new GirthError('NO_INTERSECTION', 'miter', `miter: a generator of the piece misses weld plane ${cut.weld}`);
  }
  return hit.axialMm;
}

/** Length of one piece along the generator at `phiRad` (or the centreline), mm. */
function lengthAt(piece: MiterPiece3d, tangentMm: number, phiRad: number | 'axis'): number {
  const near = piece.nearCut ? axialAt(piece.nearCut, phiRad) : tangentMm;
  const far = piece.farCut ? axialAt(piece.farCut, phiRad) : tangentMm;
  return near + far;
}

function pieceCut(piece: MiterPiece3d, tangentMm: number, count: number): MiterPieceCut {
  const end = piece.role === 'end';
  return {
    kind: 'miter-piece-cut',
    label: end ? 'End piece' : 'Middle piece',
    templateId: end ? 'miter-end' : 'miter-middle',
    count,
    center: lengthAt(piece, tangentMm, 'axis'),
    back: lengthAt(piece, tangentMm, Math.PI),
    throat: lengthAt(piece, tangentMm, 0),
  };
}

/**
 * The cut list of an elbow laid out by `miterGeometry`.
 *
 * Pieces: one entry for the end pieces (two, each with the tangent) and one for
 * the middle pieces (welds − 1 of them, when there are any), with lengths on
 * the centreline, the back and the throat, measured between the weld planes.
 *
 * Stock: the pieces come out of one straight length in elbow order. Every cut
 * serves the piece before it and the piece after it (no offcut between them);
 * each piece is turned 180° about its axis relative to the one before, so along
 * the stock the cuts lean alternately one way and the other. A straight
 * reference line marked along the stock on the first piece's throat gives each
 * cut's position on that line and on the line opposite it.
 *
 * @throws GirthError `NO_INTERSECTION` if a generator misses its weld plane
 *   (cannot happen for a geometry made by `miterGeometry`).
 * @example miterCutList(miterGeometry({ pipe, bendDeg: 90, welds: 3, radiusMm: 457.2 })).stock.lengthMm // 6 × 457.2 × tan 15°
 */
export function miterCutList(geometry: MiterGeometry): MiterCutList {
  const { pieces: all, spec } = geometry;
  const tangentMm = spec.tangentMm;
  const first = all[0];
  const firstMiddle = all[1];
  if (first === undefined) throw new GirthError('BAD_JOB', 'miter', 'miter: the elbow has no pieces');
  const pieces: MiterPieceCut[] = [pieceCut(first, tangentMm, 2)];
  if (spec.welds >= 2 && firstMiddle !== undefined) pieces.push(pieceCut(firstMiddle, tangentMm, spec.welds - 1));

  // Centre of each piece's tangent point along the stock: the first piece's square end is at 0.
  const cuts: MiterStockCut[] = [];
  let start = 0;
  let lengthMm = 0;
  for (const piece of all) {
    const near = piece.nearCut ? axialAt(piece.nearCut, 'axis') : tangentMm;
    const center = start + near;
    if (piece.farCut) {
      const k = piece.index;
      // Piece k is turned k × 180° about its axis in the stock: the reference line is its phi = k × 180°.
      const refPhi = k % 2 === 0 ? 0 : Math.PI;
      const centerAtMm = center + axialAt(piece.farCut, 'axis');
      cuts.push({
        kind: 'miter-stock-cut',
        n: piece.farCut.weld,
        centerAtMm,
        referenceLineAtMm: center + axialAt(piece.farCut, refPhi),
        oppositeLineAtMm: center + axialAt(piece.farCut, refPhi + Math.PI),
        // The piece's back (phi = 180°) sits at k × 180° + 180° round the stock.
        longSideDeg: k % 2 === 0 ? 180 : 0,
      });
      start = centerAtMm;
    }
    lengthMm += lengthAt(piece, tangentMm, 'axis');
  }
  return { kind: 'miter-cut-list', pieces, stock: { kind: 'miter-stock-plan', lengthMm, cuts, turnEachNextDeg: 180 } };
}
