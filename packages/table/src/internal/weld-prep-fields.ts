/**
 * The weld preparation's fields of the JSON result contract (present only
 * when weld preparation was asked for), every number converted by its
 * quantity. Internal to the package; `toResultJson` is the way in.
 */
import type { LayoutResult, StationWeldPrep, WeldPrep } from '@girth/unroll';
import type { FieldWriters } from './joint-fields.js';

function stationJson(s: StationWeldPrep, i: number, w: FieldWriters): Record<string, unknown> {
  const f = `weldPrep.stations[${i}]`;
  return {
    n: w.count(s.n, `${f}.n`),
    angleDeg: w.angle(s.angleDeg, `${f}.angleDeg`),
    dihedralDeg: w.angle(s.dihedralDeg, `${f}.dihedralDeg`),
    openingDeg: w.angle(s.openingDeg, `${f}.openingDeg`),
    bevel: String(s.bevel),
    ...(s.torchDeg === undefined ? {} : { torchDeg: w.angle(s.torchDeg, `${f}.torchDeg`) }),
    ...(s.bevelWidthMm === undefined ? {} : { bevelWidth: w.length(s.bevelWidthMm, `${f}.bevelWidthMm`) }),
  };
}

function ownFields(p: WeldPrep, w: FieldWriters): Record<string, unknown> {
  switch (p.kind) {
    case 'branch-weld-prep':
      return {
        fit: String(p.fit),
        hole: p.hole.map((h, i) => {
          const f = `weldPrep.hole[${i}]`;
          return {
            n: w.count(h.n, `${f}.n`),
            angleDeg: w.angle(h.angleDeg, `${f}.angleDeg`),
            torchTiltDeg: w.angle(h.torchTiltDeg, `${f}.torchTiltDeg`),
            leanAlongHeaderDeg: w.angle(h.leanAlongHeaderDeg, `${f}.leanAlongHeaderDeg`),
            leanAroundHeaderDeg: w.angle(h.leanAroundHeaderDeg, `${f}.leanAroundHeaderDeg`),
            ...(h.idGirthMm === undefined ? {} : { idGirth: w.length(h.idGirthMm, `${f}.idGirthMm`) }),
            ...(h.idAxialMm === undefined ? {} : { idAxial: w.length(h.idAxialMm, `${f}.idAxialMm`) }),
          };
        }),
      };
    case 'miter-weld-prep': {
      const e = p.squareEnds;
      const f = 'weldPrep.squareEnds';
      return {
        squareEnds: {
          kind: String(e.kind),
          wall: w.length(e.wallMm, `${f}.wallMm`),
          ...(e.kind === 'square'
            ? {}
            : {
                bevelDeg: w.angle(e.bevelDeg, `${f}.bevelDeg`),
                bevelTolDeg: w.angle(e.bevelTolDeg, `${f}.bevelTolDeg`),
                land: w.length(e.landMm, `${f}.landMm`),
                landTol: w.length(e.landTolMm, `${f}.landTolMm`),
              }),
          ...(e.kind === 'compound'
            ? { break: w.length(e.breakMm, `${f}.breakMm`), upperBevelDeg: w.angle(e.upperBevelDeg, `${f}.upperBevelDeg`) }
            : {}),
        },
      };
    }
    default:
      return {};
  }
}

/**
 * `{ weldPrep: { kind, grooveAngleDeg, land, wall, stations: [...], ... } }`
 * when the result carries weld preparation, `{}` otherwise (so results without
 * it keep their exact contract).
 */
export function weldPrepFields(result: LayoutResult, w: FieldWriters): Record<string, unknown> {
  const p = result.weldPrep;
  if (p === undefined) return {};
  return {
    weldPrep: {
      kind: String(p.kind),
      grooveAngleDeg: w.angle(p.groove.grooveAngleDeg, 'weldPrep.groove.grooveAngleDeg'),
      land: w.length(p.groove.landMm, 'weldPrep.groove.landMm'),
      wall: w.length(p.groove.wallMm, 'weldPrep.groove.wallMm'),
      stations: p.stations.map((s, i) => stationJson(s, i, w)),
      ...ownFields(p, w),
    },
  };
}
