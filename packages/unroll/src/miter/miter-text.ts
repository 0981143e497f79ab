/**
 * Words on miter templates: titles and the notes of the title block.
 */
import { formatAngleDeg, formatLengthBoth } from '@girth/pipes';
import type { MiterCutList, MiterGeometry, MiterPieceCut, ResolvedMiterSpec } from '@girth/geometry';
import { fitSurfaceNote, pipeNote } from '../plane-cut/plane-cut-text.js';

/**
 * `NPS 12 STD, 90° in 4 pieces (3 welds), R 457.2 mm (18.000 in)`.
 * @example describeMiter(spec)
 */
export function describeMiter(s: ResolvedMiterSpec): string {
  return `${s.pipe.label}, ${formatAngleDeg(s.bendDeg)} in ${s.pieceCount} pieces (${s.welds} weld${s.welds === 1 ? '' : 's'}), R ${formatLengthBoth(s.radiusMm)}`;
}

/**
 * Title and notes of one piece's template.
 * @example miterPieceText(g, list, list.pieces[0], 1021.0).title // 'Miter end piece: NPS 12 STD, 90° in 4 pieces ...'
 */
export function miterPieceText(
  g: MiterGeometry,
  list: MiterCutList,
  piece: MiterPieceCut,
  stretchOutMm: number,
): { title: string; notes: string[] } {
  const s = g.spec;
  const end = piece.templateId === 'miter-end';
  const tangent = s.tangentMm > 0 ? `; ${formatLengthBoth(s.tangentMm)} straight on each end` : '';
  const measure = end ? 'from the square end to the cut' : 'between the cuts';
  const reading = end
    ? 'Cutback is measured from the square line (through the long point, on the back) back along the pipe; Length from the square end of the piece.'
    : 'Cutback is measured back from each end\'s square line (through that end\'s long point, on the back); Length between the cuts. CENTRE marks the middle of the piece.';
  return {
    title: `Miter ${end ? 'end' : 'middle'} piece: ${describeMiter(s)}`,
    notes: [
      pipeNote(s.pipe),
      `Bend ${formatAngleDeg(s.bendDeg)} in ${s.pieceCount} pieces, ${s.welds} weld${s.welds === 1 ? '' : 's'}; each cut ${formatAngleDeg(s.cutAngleDeg)} from square; centreline radius ${formatLengthBoth(s.radiusMm)}${tangent}.`,
      `Make ${piece.count} of this piece. Lengths ${measure}: centre ${formatLengthBoth(piece.center)}, back ${formatLengthBoth(piece.back)}, throat ${formatLengthBoth(piece.throat)}.`,
      `Wrap on the OD; stretch-out ${formatLengthBoth(stretchOutMm)}. Station 1 (THROAT) goes on the throat line, the side toward the bend centre; BACK at 180°.`,
      reading,
      fitSurfaceNote(s.fitSurface, 'the weld plane'),
      `Cut all pieces from one straight length of ${formatLengthBoth(list.stock.lengthMm)} in order, no allowance for kerf; turn each next piece 180° about its axis before fitting.`,
      ...g.warnings.map((w) => `Warning: ${w.message}`),
    ],
  };
}
