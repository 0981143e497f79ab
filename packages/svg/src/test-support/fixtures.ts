/**
 * Templates for tests, built here from published formulas (not from
 * @girth/unroll), so the exporter is checked against the outside.
 * Jobs and pieces are invented.
 */
import type { FlatTemplate, HoleTemplate, PathPart, Point2, StationLine, StationRow, WrapTemplate } from '@girth/unroll';

const DEG = Math.PI / 180;

/** Invented job for demo sheets. */
export const DEMO_JOB = 'J-4417 Brinewell cooling loop';
/** Invented piece for demo sheets. */
export const DEMO_PIECE = 'Spool 12-B';

/**
 * Wrap template of a plane cut-back on a pipe of OD `odMm` cut at `cutDeg`:
 * ordinate (D/2) tan(c) (1 - cos phi) above the square line (REFERENCES.md, "Miter":
 * the ordinate of a plane cut), phi = 0 (heel, station 1) at x = 0, girth x = (D/2) phi.
 */
export function planeCutWrap(odMm: number, cutDeg: number, stations = 16, pointsPerStation = 8): WrapTemplate {
  const r = odMm / 2;
  const stretchOutMm = Math.PI * odMm;
  const ordinate = (phi: number): number => r * Math.tan(cutDeg * DEG) * (1 - Math.cos(phi));
  const n = stations * pointsPerStation;
  const points: Point2[] = [];
  for (let i = 0; i <= n; i++) {
    const phi = (2 * Math.PI * i) / n;
    points.push([r * phi, ordinate(phi)]);
  }
  const stationLines: StationLine[] = [];
  const rows: StationRow[] = [];
  for (let k = 0; k <= stations; k++) {
    const phi = (2 * Math.PI * k) / stations;
    const x = r * phi;
    const stationN = (k % stations) + 1;
    stationLines.push({ n: stationN, angleDeg: (360 * k) / stations, from: [x, 0], to: [x, ordinate(phi)] });
    if (k < stations) rows.push({ n: stationN, angleDeg: (360 * k) / stations, values: { girth: x, cutback: ordinate(phi) } });
  }
  return {
    id: 'plane-cut',
    kind: 'wrap',
    title: `Plane cut-back: ${odMm} mm OD pipe, cut ${cutDeg}°`,
    notes: [`Pipe OD ${odMm} mm; ${stations} stations`, 'HEEL at station 1, TOE at station ' + (stations / 2 + 1)],
    stretchOutMm,
    wrapOdMm: odMm,
    cut: [{ kind: 'polyline', points, closed: false }],
    squareLine: { kind: 'segment', from: [0, 0], to: [stretchOutMm, 0] },
    startLine: 'heel',
    stationLines,
    marks: [],
    labels: [
      { text: 'HEEL', at: [0, -10], heightMm: 4 },
      { text: 'TOE', at: [stretchOutMm / 2, -10], heightMm: 4 },
    ],
    stationColumns: [
      { key: 'girth', heading: 'Girth', quantity: 'length' },
      { key: 'cutback', heading: 'Cutback', quantity: 'length' },
    ],
    stations: rows,
  };
}

/**
 * Hole template of a branch of radius `rMm` square on a header of radius `RMm`
 * (MathWorld, "Cylinder-Cylinder Intersection"): around the header
 * x = R asin(r sin phi / R), along it y = r cos phi. A closed, ellipse-like contour.
 */
export function teeHole(RMm: number, rMm: number, points = 256): HoleTemplate {
  const contour: Point2[] = [];
  for (let i = 0; i < points; i++) {
    const phi = (2 * Math.PI * i) / points;
    contour.push([RMm * Math.asin((rMm * Math.sin(phi)) / RMm), rMm * Math.cos(phi)]);
  }
  const halfGirth = RMm * Math.asin(rMm / RMm);
  const marks: PathPart[] = [
    { kind: 'segment', from: [-halfGirth - 10, 0], to: [halfGirth + 10, 0] },
    { kind: 'segment', from: [0, -rMm - 10], to: [0, rMm + 10] },
  ];
  return {
    id: 'header-hole',
    kind: 'hole',
    title: `Header hole: ${2 * rMm} mm branch on ${2 * RMm} mm header, 90°`,
    notes: ['Centre lines: header top line and branch axis'],
    wrapOdMm: 2 * RMm,
    cut: [{ kind: 'polyline', points: contour, closed: true }],
    stationLines: [],
    marks,
    labels: [{ text: 'TOP LINE', at: [halfGirth + 30, 4], heightMm: 3 }],
    stationColumns: [],
    stations: [],
  };
}

/**
 * Flat pattern of a concentric cone (REFERENCES.md, "Concentric cone development"):
 * slant s = sqrt(L² + ((D - d)/2)²), radii D s / (D - d) and d s / (D - d),
 * sweep 180° (D - d) / s. Centre at the origin, the sweep centred on +y.
 */
export function coneSector(bigMm: number, smallMm: number, heightMm: number): FlatTemplate {
  const s = Math.hypot(heightMm, (bigMm - smallMm) / 2);
  const outer = (bigMm * s) / (bigMm - smallMm);
  const inner = (smallMm * s) / (bigMm - smallMm);
  const sweepDeg = (180 * (bigMm - smallMm)) / s;
  const a0 = 90 - sweepDeg / 2;
  const a1 = 90 + sweepDeg / 2;
  const at = (radius: number, deg: number): Point2 => [radius * Math.cos(deg * DEG), radius * Math.sin(deg * DEG)];
  return {
    id: 'cone-pattern',
    kind: 'flat',
    title: `Cone pattern: ${bigMm} mm to ${smallMm} mm, ${heightMm} mm long`,
    notes: [`Slant ${Math.round(s * 1000) / 1000} mm; sweep ${Math.round(sweepDeg * 1000) / 1000}°`],
    cut: [
      { kind: 'arc', center: [0, 0], radiusMm: outer, startDeg: a0, endDeg: a1 },
      { kind: 'segment', from: at(outer, a1), to: at(inner, a1) },
      { kind: 'arc', center: [0, 0], radiusMm: inner, startDeg: a0, endDeg: a1 },
      { kind: 'segment', from: at(inner, a0), to: at(outer, a0) },
    ],
    stationLines: [],
    marks: [{ kind: 'segment', from: [0, inner], to: [0, outer] }],
    labels: [{ text: 'SEAM', at: at((inner + outer) / 2, a0 + 6), heightMm: 3 }],
    stationColumns: [],
    stations: [],
  };
}
