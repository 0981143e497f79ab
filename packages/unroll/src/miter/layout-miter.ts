/**
 * A miter elbow laid out: a wrap template for each kind of piece and the cut list.
 */
import { GirthError } from '@girth/pipes';
import { hitGenerator, miterCutList, miterGeometry, type MiterCutEnd, type MiterSpec } from '@girth/geometry';
import type { PipeUsed, Segment2, Template, WrapTemplate } from '../types.js';
import type { TemplateFacts } from '../facts.js';
import { developWrap, WRAP_LABEL_HEIGHT_MM, type WrapLabel } from '../wrap/develop-wrap.js';
import { resolveCutStations, type CutLayoutOptions } from '../plane-cut/layout-options.js';
import { developTwoCutWrap } from './develop-two-cut-wrap.js';
import { miterPieceText } from './miter-text.js';
import type { MiterLayout } from './types.js';
import { requireWithinReach } from '../internal/template-reach.js';

const PIECE_LABELS: readonly WrapLabel[] = [
  { text: 'THROAT', phiRad: 0 },
  { text: 'BACK', phiRad: Math.PI },
];

/**
 * Lays out a miter elbow. Cut angle = bend / (2 × welds) (ASME B31.3 para.
 * 304.2.3: the change of direction at a joint divided by two). Every cut comes
 * from intersecting the piece's generators with its weld plane in the assembled
 * elbow (see `miterGeometry`), then developed onto a wrap for the OD:
 *
 * - `miter-end` (both end pieces: one cut, the other end square): `girth`,
 *   `cutback` from the square line through the long point (the back), and
 *   `length` from the square end; the square end is drawn as a mark.
 * - `miter-middle` (welds − 1 pieces, cut at both ends): see
 *   `developTwoCutWrap`; the far cut is the near cut turned 180° about the
 *   pipe axis and moved one centre length along it.
 *
 * Station 1 is on the throat (toward the bend centre), 180° on the back. With
 * the default fit surface `od`, the cutbacks are (D/2) tan(c) (1 + cos phi).
 * Warnings (ASME B31.3 para. 304.2.3, multiple miters): cut angle over 22.5°,
 * radius below eq. (5) as recalled.
 *
 * @param spec see `MiterSpec`: pipe, `bendDeg`, `welds` or `pieces`, `radiusMm` or
 *   `radiusNps`, optional `tangentMm`, `fitSurface` and `gapMm` (root gap at
 *   every weld: each piece end set back half of it, square to its weld plane).
 * @param options `stations` (4 to 360, default 16), `chordToleranceMm` (default 0.05).
 * @throws GirthError as `resolveMiterSpec` (bad bend, counts, radius, tangent,
 *   NaN/Infinity), `OUT_OF_RANGE` for a bad station count, the option errors of `sampleCut`.
 * @example
 * const elbow = layoutMiter({ pipe: { odMm: 323.85, wallMm: 9.525, label: 'NPS 12 STD', npsIn: 12 },
 *   bendDeg: 90, pieces: 4, radiusNps: 1.5 });
 * elbow.cutAngleDeg // 15
 * elbow.templates.map((t) => t.id) // ['miter-end', 'miter-middle']
 */
export function layoutMiter(spec: MiterSpec, options: CutLayoutOptions = {}): MiterLayout {
  const g = miterGeometry(spec);
  const stations = resolveCutStations(options);
  const list = miterCutList(g);
  const s = g.spec;
  const wrapOdMm = s.pipe.odMm;
  const stretchOutMm = Math.PI * wrapOdMm;
  const chord = options.chordToleranceMm === undefined ? {} : { chordToleranceMm: options.chordToleranceMm };

  const templates: Template[] = [];
  for (const piece of list.pieces) {
    const text = miterPieceText(g, list, piece, stretchOutMm);
    if (piece.templateId === 'miter-end') {
      const first = g.pieces[0];
      if (!first?.farCut) throw new GirthError('BAD_JOB', 'miter', 'miter: the first piece has no cut');
      templates.push(endTemplate(first.farCut, s.tangentMm, { wrapOdMm, stations, ...chord, ...text }));
    } else {
      const middle = g.pieces[1];
      if (!middle?.nearCut || !middle.farCut) throw new GirthError('BAD_JOB', 'miter', 'miter: the middle piece lacks a cut');
      templates.push(
        developTwoCutWrap({
          near: middle.nearCut,
          far: middle.farCut,
          wrapOdMm,
          stations,
          ...chord,
          id: 'miter-middle',
          ...text,
          labels: PIECE_LABELS,
        }),
      );
    }
  }

  const radiusField = spec.radiusMm !== undefined ? 'radiusMm' : 'radiusNps';
  requireWithinReach(templates, radiusField, spec[radiusField], 'give a smaller centreline radius or more welds');

  const pipe: PipeUsed = { role: 'pipe', label: s.pipe.label, odMm: s.pipe.odMm, wallMm: s.pipe.wallMm, idMm: s.pipe.idMm };
  return {
    kind: 'miter',
    templates,
    pipes: [pipe],
    warnings: g.warnings,
    bendDeg: s.bendDeg,
    welds: s.welds,
    pieceCount: s.pieceCount,
    cutAngleDeg: s.cutAngleDeg,
    radiusMm: s.radiusMm,
    tangentMm: s.tangentMm,
    fitSurface: s.fitSurface,
    gapMm: s.gapMm,
    stations,
    pieces: list.pieces,
    stock: list.stock,
    stockLengthMm: list.stock.lengthMm,
  };
}

/**
 * The end piece's wrap: the generic wrap of its one cut, plus the `length`
 * column (from the square end) and the square end drawn as a mark.
 */
function endTemplate(
  cut: MiterCutEnd,
  tangentMm: number,
  o: { wrapOdMm: number; stations: number; chordToleranceMm?: number; title: string; notes: readonly string[]; facts: TemplateFacts },
): WrapTemplate {
  const t = developWrap({ bundle: cut.bundle, host: cut.host, id: 'miter-end', labels: PIECE_LABELS, startLine: 'throat', ...o });
  // Axial position of the square line (the long point), from the piece's tangent point toward the cut.
  const heel = hitGenerator(cut.bundle, cut.host, 0);
  const heelCutback = t.stations[0]?.values.cutback;
  if (heel === undefined || heelCutback === undefined) throw new GirthError('NO_INTERSECTION', 'stations', 'stations: the throat generator misses the weld plane');
  const squareEndY = heel.axialMm + heelCutback + tangentMm;
  const squareEnd: Segment2 = { kind: 'segment', from: [0, squareEndY], to: [t.stretchOutMm, squareEndY] };
  return {
    ...t,
    marks: [...t.marks, squareEnd],
    labels: [...t.labels, { text: 'SQUARE END', at: [(t.stretchOutMm) / 2, squareEndY - 1.5 * WRAP_LABEL_HEIGHT_MM], heightMm: WRAP_LABEL_HEIGHT_MM }],
    stationColumns: [...t.stationColumns, { key: 'length', heading: 'Length', quantity: 'length' }],
    stations: t.stations.map((row) => ({ ...row, values: { ...row.values, length: squareEndY - (row.values.cutback ?? NaN) } })),
  };
}
