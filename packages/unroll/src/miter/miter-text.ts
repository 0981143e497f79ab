/**
 * Words on miter templates: titles and the notes of the title block, as typed facts.
 */
import type { MiterCutList, MiterGeometry, MiterPieceCut, ResolvedMiterSpec } from '@girth/geometry';
import { angleFact, factLine, lengthFact, textLine, worded, type FactLine } from '../facts.js';
import { fitSurfaceNote, pipeNote } from '../plane-cut/plane-cut-text.js';

/**
 * `NPS 12 STD, 90° in 4 pieces (3 welds), R 457.2 mm (18.000 in)` once worded.
 * @example describeLine(describeMiter(spec))
 */
export function describeMiter(s: ResolvedMiterSpec): FactLine {
  return factLine`${s.pipe.label}, ${angleFact(s.bendDeg)} in ${s.pieceCount} pieces (${s.welds} weld${s.welds === 1 ? '' : 's'}), R ${lengthFact(s.radiusMm)}`;
}

/**
 * Title, notes and facts of one piece's template.
 * @example miterPieceText(g, list, list.pieces[0], 1021.0).title // 'Miter end piece: NPS 12 STD, 90° in 4 pieces ...'
 */
/**
 * The root gap's note, none without a gap: each piece end is set back half the
 * gap from its weld plane, so the lengths and the stock already allow for it.
 */
function gapNote(gapMm: number, cutAngleDeg: number, welds: number): FactLine[] {
  if (!(gapMm > 0)) return [];
  const alongMm = gapMm / (2 * Math.cos((cutAngleDeg * Math.PI) / 180));
  return [
    factLine`Root gap ${lengthFact(gapMm)} at each weld, square to the weld plane: every piece end is set back ${lengthFact(gapMm / 2)} from its weld plane (${lengthFact(alongMm)} along the pipe), so the lengths here and the stock (${lengthFact(2 * alongMm * welds)} shorter than without the gap) already allow for it; one cut still serves the pieces on both sides of it.`,
  ];
}

export function miterPieceText(g: MiterGeometry, list: MiterCutList, piece: MiterPieceCut, stretchOutMm: number): ReturnType<typeof worded> {
  const s = g.spec;
  const end = piece.templateId === 'miter-end';
  const tangent = s.tangentMm > 0 ? factLine`; ${lengthFact(s.tangentMm)} straight on each end` : [];
  const measure = end ? 'from the square end to the cut' : 'between the cuts';
  const reading = end
    ? 'Cutback is measured from the square line (through the long point, on the back) back along the pipe; Length from the square end of the piece.'
    : 'Cutback is measured back from each end\'s square line (through that end\'s long point, on the back); Length between the cuts. CENTRE marks the middle of the piece.';
  return worded({
    title: factLine`Miter ${end ? 'end' : 'middle'} piece: ${describeMiter(s)}`,
    notes: [
      pipeNote(s.pipe),
      factLine`Bend ${angleFact(s.bendDeg)} in ${s.pieceCount} pieces, ${s.welds} weld${s.welds === 1 ? '' : 's'}; each cut ${angleFact(s.cutAngleDeg)} from square; centreline radius ${lengthFact(s.radiusMm)}${tangent}.`,
      factLine`Make ${piece.count} of this piece. Lengths ${measure}: centre ${lengthFact(piece.center)}, back ${lengthFact(piece.back)}, throat ${lengthFact(piece.throat)}.`,
      factLine`Wrap on the OD; stretch-out ${lengthFact(stretchOutMm)}. Station 1 (THROAT) goes on the throat line, the side toward the bend centre; BACK at 180°.`,
      textLine(reading),
      fitSurfaceNote(s.fitSurface, 'the weld plane'),
      ...gapNote(s.gapMm, s.cutAngleDeg, s.welds),
      factLine`Cut all pieces from one straight length of ${lengthFact(list.stock.lengthMm)} in order, no allowance for kerf; turn each next piece 180° about its axis before fitting.`,
      ...g.warnings.map((w) => textLine(`Warning: ${w.message}`)),
    ],
  });
}
