/**
 * Test templates built here from published geometry, not from Girth's own
 * layout code, so the exporter is checked against outside formulas:
 *
 * - planeCutWrap: a wrap template of a plane cut-back; ordinate
 *   (D/2) tan(c) (1 - cos phi) (REFERENCES.md, "Miter", the ordinate of a
 *   plane cut).
 * - teeHole: the hole a 90° branch of radius r cuts in a header of radius R,
 *   developed on the header OD: girth R asin(r sin phi / R), axial r cos phi
 *   (MathWorld, "Cylinder-Cylinder Intersection": the saddle of two cylinders
 *   crossing at 90°).
 * - conePattern: the flat annular sector of a concentric cone; slant
 *   s = sqrt(L² + ((D - d)/2)²), radii D s / (D - d) and d s / (D - d),
 *   sweep 180° (D - d) / s (REFERENCES.md, cone development; L. Longfield,
 *   Sheet Metal Drafting, 1921).
 */
import type { FlatTemplate, HoleTemplate, PathPart, Point2, StationLine, StationRow, WrapTemplate } from '@girth/unroll';

const DEG = Math.PI / 180;

/** A wrap template of a plane cut at `cutAngleDeg` on a pipe of `odMm`, `samples` points along the girth. */
export function planeCutWrap(odMm: number, cutAngleDeg: number, samples = 361, stationCount = 16): WrapTemplate {
  const r = odMm / 2;
  const girthMm = Math.PI * odMm;
  const ordinate = (phiRad: number): number => r * Math.tan(cutAngleDeg * DEG) * (1 - Math.cos(phiRad));
  const points: Point2[] = [];
  for (let i = 0; i < samples; i++) {
    const phi = (2 * Math.PI * i) / (samples - 1);
    points.push([r * phi, ordinate(phi)]);
  }
  const stationLines: StationLine[] = [];
  const stations: StationRow[] = [];
  for (let n = 1; n <= stationCount; n++) {
    const angleDeg = (360 * (n - 1)) / stationCount;
    const x = r * angleDeg * DEG;
    const y = ordinate(angleDeg * DEG);
    stationLines.push({ n, angleDeg, from: [x, 0], to: [x, y] });
    stations.push({ n, angleDeg, values: { girth: x, cutback: y } });
  }
  return {
    id: 'plane-cut',
    kind: 'wrap',
    title: `Plane cut ${cutAngleDeg}° on Ø${Number(odMm.toFixed(3))} mm`,
    notes: ['Wrap on the OD; square line to the pipe end.'],
    stretchOutMm: girthMm,
    wrapOdMm: odMm,
    cut: [{ kind: 'polyline', points, closed: false }],
    squareLine: { kind: 'segment', from: [0, 0], to: [girthMm, 0] },
    startLine: 'heel',
    stationLines,
    marks: [{ kind: 'segment', from: [girthMm, 0], to: [girthMm, ordinate(Math.PI * 2)] }],
    labels: [
      { text: 'HEEL', at: [0, -8], heightMm: 4 },
      { text: 'TOE', at: [girthMm / 2, -8], heightMm: 4 },
    ],
    stationColumns: [
      { key: 'girth', heading: 'Girth', quantity: 'length' },
      { key: 'cutback', heading: 'Cutback', quantity: 'length' },
    ],
    stations,
  };
}

/** Girth and axial position (mm) of the tee hole at branch station angle `phiRad`. */
export function teeHolePoint(headerOdMm: number, branchDiaMm: number, phiRad: number): Point2 {
  const R = headerOdMm / 2;
  const r = branchDiaMm / 2;
  return [R * Math.asin((r * Math.sin(phiRad)) / R), r * Math.cos(phiRad)];
}

/** The closed hole of a 90° set-on branch (branch ID `branchIdMm`) on a header of `headerOdMm`. */
export function teeHole(headerOdMm: number, branchIdMm: number, samples = 720): HoleTemplate {
  const points: Point2[] = [];
  for (let i = 0; i < samples; i++) points.push(teeHolePoint(headerOdMm, branchIdMm, (2 * Math.PI * i) / samples));
  const rows: StationRow[] = [];
  for (let n = 1; n <= 16; n++) {
    const angleDeg = (360 * (n - 1)) / 16;
    const [girth, axial] = teeHolePoint(headerOdMm, branchIdMm, angleDeg * DEG);
    rows.push({ n, angleDeg, values: { girth, axial } });
  }
  const reach = points.reduce((m, p) => Math.max(m, Math.abs(p[0])), 0);
  return {
    id: 'header-hole',
    kind: 'hole',
    title: 'Header hole: 90° set-on branch',
    notes: ['Top line of the header at girth 0.'],
    wrapOdMm: headerOdMm,
    cut: [{ kind: 'polyline', points, closed: true }],
    stationLines: [],
    marks: [
      { kind: 'segment', from: [0, -branchIdMm], to: [0, branchIdMm] },
      { kind: 'segment', from: [-reach - 20, 0], to: [reach + 20, 0] },
    ],
    labels: [{ text: 'TOP', at: [0, branchIdMm + 8], heightMm: 4 }],
    stationColumns: [
      { key: 'girth', heading: 'Girth', quantity: 'length' },
      { key: 'axial', heading: 'Axial', quantity: 'length' },
    ],
    stations: rows,
  };
}

/** Pattern radii and sweep of a concentric cone. */
export function coneDevelopment(largeDiaMm: number, smallDiaMm: number, lengthMm: number): {
  slantMm: number;
  outerRadiusMm: number;
  innerRadiusMm: number;
  sweepDeg: number;
} {
  const dd = largeDiaMm - smallDiaMm;
  const slantMm = Math.hypot(lengthMm, dd / 2);
  return {
    slantMm,
    outerRadiusMm: (largeDiaMm * slantMm) / dd,
    innerRadiusMm: (smallDiaMm * slantMm) / dd,
    sweepDeg: (180 * dd) / slantMm,
  };
}

/**
 * The flat pattern of a concentric cone as an annular sector centred on the
 * origin, symmetric about +y: outer arc, side, inner arc (walked backwards),
 * side, so the exporter must join and reverse parts to close it.
 */
export function conePattern(largeDiaMm: number, smallDiaMm: number, lengthMm: number): FlatTemplate {
  const { outerRadiusMm, innerRadiusMm, sweepDeg } = coneDevelopment(largeDiaMm, smallDiaMm, lengthMm);
  const startDeg = 90 - sweepDeg / 2;
  const endDeg = 90 + sweepDeg / 2;
  const at = (radius: number, deg: number): Point2 => [radius * Math.cos(deg * DEG), radius * Math.sin(deg * DEG)];
  const cut: PathPart[] = [
    { kind: 'arc', center: [0, 0], radiusMm: outerRadiusMm, startDeg, endDeg },
    { kind: 'segment', from: at(outerRadiusMm, endDeg), to: at(innerRadiusMm, endDeg) },
    { kind: 'arc', center: [0, 0], radiusMm: innerRadiusMm, startDeg, endDeg },
    { kind: 'segment', from: at(innerRadiusMm, startDeg), to: at(outerRadiusMm, startDeg) },
  ];
  return {
    id: 'cone-pattern',
    kind: 'flat',
    title: `Cone pattern Ø${Number(largeDiaMm.toFixed(2))} x Ø${Number(smallDiaMm.toFixed(2))} x ${Number(lengthMm.toFixed(2))} mm`,
    notes: [],
    cut,
    stationLines: [],
    marks: [{ kind: 'segment', from: at(innerRadiusMm, 90), to: at(outerRadiusMm, 90) }],
    labels: [{ text: 'LARGE END', at: [0, outerRadiusMm - 10], heightMm: 5 }],
    stationColumns: [],
    stations: [],
  };
}
