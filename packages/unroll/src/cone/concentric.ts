/**
 * Concentric reducer: the flat pattern of a right cone frustum, an annular
 * sector drawn with true arcs.
 */
import { sheetElement } from '@girth/geometry';
import type { Point2, StationLine, StationRow, Template, TemplateLabel } from '../types.js';
import { angleFact, factLine, lengthFact, textLine, worded, type FactLine } from '../facts.js';
import { coneTitle, commonConeNotes, CONE_LABEL_HEIGHT_MM } from './internal/cone-text.js';
import { coneResultBase } from './internal/cone-result.js';
import { arcExtremePoints, boundsOfPoints } from './internal/plate-frame.js';
import { resolveCone } from './internal/resolve-cone.js';
import type { ConcentricConeLayout, ConcentricConePiece, ConeLayoutOptions, ConePattern, ConeSpec } from './types.js';
import { requireConeWithinReach } from './internal/cone-reach.js';

const RAD = Math.PI / 180;

/**
 * The flat pattern of a concentric reducer.
 *
 * Developed on the mean surface of the plate (see `makeConeSheet`): with mean
 * end diameters D, d and axial length L, the slant height is
 * s = sqrt(L² + ((D − d)/2)²), the pattern radii D s / (D − d) and
 * d s / (D − d), and the sweep 180° (D − d) / s. Each piece is an annular
 * sector drawn with two true arcs (`Arc2`, centre at the cone's apex) and two
 * straight seam edges, turned so its middle element stands upright with the
 * large (outer) arc on top, as seen from the outside of the cone, and placed
 * with its bounding rectangle from (0, 0). Station lines are the elements at
 * the N stations (station 1 on the right-hand seam edge, numbers rising to the
 * left); each piece lists its stations from edge to edge, the closing edge of
 * the cone as row N + 1 at 360°. Columns: `outerArc` and `innerArc` (girth
 * along the outer and inner arc from the piece's first edge) and `element`
 * (slant length), mm.
 *
 * The `cut` of each template is, in order: outer arc, left edge (outer to
 * inner), inner arc, right edge (inner to outer). Arcs run counter-clockwise
 * from `startDeg` to `endDeg`.
 *
 * @param spec diameters, length or apex angle, plate thickness (see {@link ConeSpec}).
 * @param options stations (4..360, default 16), segments (1..stations, dividing them), formatLength.
 * @throws GirthError as `resolveCone`: `OUT_OF_RANGE` for a small end not
 *   smaller (field `smallDiameterMm`), `NEGATIVE` for a length ≤ 0,
 *   `BAD_OPTION` for both or neither of length and angle, `WALL_TOO_THICK`,
 *   `NOT_A_NUMBER`/`NOT_FINITE`, and the station/segment limits.
 * @example
 * const r = layoutConcentricCone({ largeDiameterMm: 203.2, smallDiameterMm: 127, lengthMm: 101.6, thicknessMm: 0 });
 * r.pattern.sweepDeg // ≈ 126.4
 */
export function layoutConcentricCone(spec: ConeSpec, options: ConeLayoutOptions = {}): ConcentricConeLayout {
  const cone = resolveCone(spec, options, 'concentric');
  const el = sheetElement(cone.sheet, 0);
  const meanR = Math.hypot(el.large[0], el.large[1]);
  const meanr = Math.hypot(el.small[0], el.small[1]);
  const slant = Math.hypot(cone.lengthMm, meanR - meanr);
  const ratio = (meanR - meanr) / slant; // flat angle per angle around the cone (sine of the half-apex angle)
  const pattern: ConePattern = {
    outerRadius: meanR / ratio,
    innerRadius: meanr / ratio,
    sweepDeg: 360 * ratio,
    slantHeight: slant,
  };
  const N = cone.stations;
  const k = cone.segments;
  const perPiece = N / k;
  const pieceSweepDeg = pattern.sweepDeg / k;
  const common = commonConeNotes(cone, 2 * Math.PI * meanR, 2 * Math.PI * meanr);

  const pieces: ConcentricConePiece[] = [];
  const templates: Template[] = [];
  for (let j = 0; j < k; j++) {
    const startDeg = 90 - pieceSweepDeg / 2;
    const endDeg = 90 + pieceSweepDeg / 2;
    const bounds = boundsOfPoints([
      ...arcExtremePoints([0, 0], pattern.outerRadius, startDeg, endDeg),
      ...arcExtremePoints([0, 0], pattern.innerRadius, startDeg, endDeg),
    ]);
    const center: Point2 = [-bounds.minX, -bounds.minY];
    const at = (radius: number, flatDeg: number): Point2 => [
      center[0] + radius * Math.cos(flatDeg * RAD),
      center[1] + radius * Math.sin(flatDeg * RAD),
    ];
    const stationLines: StationLine[] = [];
    const stations: StationRow[] = [];
    for (let g = j * perPiece; g <= (j + 1) * perPiece; g++) {
      const localDeg = ((g - j * perPiece) * 360) / N;
      const flatDeg = startDeg + localDeg * ratio;
      const angleDeg = (g * 360) / N;
      stationLines.push({ n: g + 1, angleDeg, from: at(pattern.outerRadius, flatDeg), to: at(pattern.innerRadius, flatDeg) });
      stations.push({
        n: g + 1,
        angleDeg,
        values: { outerArc: meanR * localDeg * RAD, innerArc: meanr * localDeg * RAD, element: slant },
      });
    }
    const midRadius = (pattern.outerRadius + pattern.innerRadius) / 2;
    const inset = (1.5 * CONE_LABEL_HEIGHT_MM) / midRadius / RAD;
    const labels: TemplateLabel[] = [
      { text: 'SEAM', at: at(midRadius, startDeg + Math.min(inset, pieceSweepDeg / 4)), heightMm: CONE_LABEL_HEIGHT_MM },
      { text: 'SEAM', at: at(midRadius, endDeg - Math.min(inset, pieceSweepDeg / 4)), heightMm: CONE_LABEL_HEIGHT_MM },
    ];
    const half = (pieceSweepDeg / 2) * RAD;
    const piece: ConcentricConePiece = {
      templateId: k === 1 ? 'cone-pattern' : `cone-pattern-${j + 1}`,
      startAngleDeg: (j * 360) / k,
      endAngleDeg: ((j + 1) * 360) / k,
      widthMm: bounds.maxX - bounds.minX,
      heightMm: bounds.maxY - bounds.minY,
      sweepDeg: pieceSweepDeg,
      centerMm: center,
      outerChordMm: 2 * pattern.outerRadius * Math.sin(half),
      outerRiseMm: pattern.outerRadius * (1 - Math.cos(half)),
      innerChordMm: 2 * pattern.innerRadius * Math.sin(half),
      innerRiseMm: pattern.innerRadius * (1 - Math.cos(half)),
    };
    pieces.push(piece);
    const notes: FactLine[] = [
      ...common,
      factLine`Pattern: outer radius ${lengthFact(pattern.outerRadius)}, inner radius ${lengthFact(pattern.innerRadius)}, sweep ${angleFact(pattern.sweepDeg, 2)}, slant height ${lengthFact(slant)}.`,
      ...(k > 1
        ? [factLine`Piece ${j + 1} of ${k}: sweep ${angleFact(pieceSweepDeg, 2)}, from ${angleFact(piece.startAngleDeg, 2)} to ${angleFact(piece.endAngleDeg, 2)} around the cone.`]
        : []),
      factLine`Plate ${lengthFact(piece.widthMm)} x ${lengthFact(piece.heightMm)}; outer arc chord ${lengthFact(piece.outerChordMm)}, rise ${lengthFact(piece.outerRiseMm)}; inner arc chord ${lengthFact(piece.innerChordMm)}, rise ${lengthFact(piece.innerRiseMm)}; arc centre at (${lengthFact(center[0])}, ${lengthFact(center[1])}) from the plate corner.`,
      factLine`${N} stations around the cone, every ${angleFact(360 / N, 2)}; station 1 on the seam, numbers rising to the left (seen from outside); station lines are elements ${lengthFact(slant)} long.`,
    ];
    const outerStart = at(pattern.outerRadius, startDeg);
    const outerEnd = at(pattern.outerRadius, endDeg);
    const innerStart = at(pattern.innerRadius, startDeg);
    const innerEnd = at(pattern.innerRadius, endDeg);
    templates.push({
      id: piece.templateId,
      kind: 'flat',
      ...worded({ title: textLine(coneTitle(cone, j)), notes }),
      cut: [
        { kind: 'arc', center, radiusMm: pattern.outerRadius, startDeg, endDeg },
        { kind: 'segment', from: outerEnd, to: innerEnd },
        { kind: 'arc', center, radiusMm: pattern.innerRadius, startDeg, endDeg },
        { kind: 'segment', from: innerStart, to: outerStart },
      ],
      stationLines,
      marks: [],
      labels,
      stationColumns: [
        { key: 'outerArc', heading: 'Outer arc', quantity: 'length' },
        { key: 'innerArc', heading: 'Inner arc', quantity: 'length' },
        { key: 'element', heading: 'Element', quantity: 'length' },
      ],
      stations,
    });
  }

  requireConeWithinReach(spec, templates);
  return {
    ...coneResultBase(cone, N, k, { large: 2 * Math.PI * meanR, small: 2 * Math.PI * meanr }, templates),
    form: 'concentric',
    pattern,
    pieces,
  };
}
