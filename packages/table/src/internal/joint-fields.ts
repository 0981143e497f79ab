/**
 * Each joint kind's own fields of the JSON result contract (a branch's angle
 * and offset, a miter's `pieces`, a cone's `pattern`, ...), every number
 * converted by its quantity: lengths to the result's unit, angles in degrees,
 * counts as they are. Internal to the package; `toResultJson` is the way in.
 */
import type { BranchLayout, ConeLayout, LayoutResult, MiterLayout, NozzleLayout, PadLayout, PlaneCutLayout, ShellPlateLayout, TrunnionLayout } from '@girth/unroll';

/** How the contract writes one number: by its quantity, naming its field in errors. */
export interface FieldWriters {
  /** A length in mm, written in the result's unit. */
  readonly length: (mm: unknown, field: string) => number;
  /** An angle in degrees, unchanged but for float noise. */
  readonly angle: (deg: unknown, field: string) => number;
  /** A count or a station number, unchanged. */
  readonly count: (value: unknown, field: string) => number;
}

function branchFields(r: BranchLayout, w: FieldWriters): Record<string, unknown> {
  return {
    angleDeg: w.angle(r.angleDeg, 'angleDeg'),
    offset: w.length(r.offsetMm, 'offsetMm'),
    gap: w.length(r.gapMm, 'gapMm'),
    fit: String(r.fit),
    contact: { branch: String(r.contact.branch), header: String(r.contact.header) },
    stationCount: w.count(r.stations, 'stations'),
  };
}

function nozzleFields(r: NozzleLayout, w: FieldWriters): Record<string, unknown> {
  return {
    offset: w.length(r.offsetMm, 'offsetMm'),
    direction: String(r.direction),
    tiltDeg: w.angle(r.tiltDeg, 'tiltDeg'),
    fit: String(r.fit),
    gap: w.length(r.gapMm, 'gapMm'),
    stationCount: w.count(r.stations, 'stations'),
    aroundTapeBound: w.length(r.aroundTapeBoundMm, 'aroundTapeBoundMm'),
  };
}

function trunnionFields(r: TrunnionLayout, w: FieldWriters): Record<string, unknown> {
  return {
    bendRadius: w.length(r.bendRadiusMm, 'bendRadiusMm'),
    bendDeg: w.angle(r.bendDeg, 'bendDeg'),
    alongDeg: w.angle(r.alongDeg, 'alongDeg'),
    aroundDeg: w.angle(r.aroundDeg, 'aroundDeg'),
    direction: String(r.direction),
    tiltFromNormalDeg: w.angle(r.tiltFromNormalDeg, 'tiltFromNormalDeg'),
    fit: String(r.fit),
    gap: w.length(r.gapMm, 'gapMm'),
    stationCount: w.count(r.stations, 'stations'),
    alongTapeBound: w.length(r.alongTapeBoundMm, 'alongTapeBoundMm'),
  };
}

function padFields(r: PadLayout, w: FieldWriters): Record<string, unknown> {
  return {
    angleDeg: w.angle(r.angleDeg, 'angleDeg'),
    thickness: w.length(r.thicknessMm, 'thicknessMm'),
    sizedBy: String(r.sizedBy),
    width: w.length(r.widthMm, 'widthMm'),
    midRadius: w.length(r.midRadiusMm, 'midRadiusMm'),
    stationCount: w.count(r.stations, 'stations'),
  };
}

function shellPlateFields(r: ShellPlateLayout, w: FieldWriters): Record<string, unknown> {
  return {
    length: w.length(r.lengthMm, 'lengthMm'),
    thickness: w.length(r.thicknessMm, 'thicknessMm'),
    plateWidth: w.length(r.plateWidthMm, 'plateWidthMm'),
    courses: w.count(r.courses, 'courses'),
    courseLength: w.length(r.courseLengthMm, 'courseLengthMm'),
    seamClock: w.count(r.seamClockHours, 'seamClockHours'),
    weldZone: w.length(r.weldZoneMm, 'weldZoneMm'),
    holes: r.holes.map((h, i) => ({
      name: String(h.name),
      course: w.count(h.course, `holes[${i}].course`),
      girth: w.length(h.girthMm, `holes[${i}].girthMm`),
      axial: w.length(h.axialMm, `holes[${i}].axialMm`),
      station: w.length(h.stationMm, `holes[${i}].stationMm`),
      clock: w.count(h.clockHours, `holes[${i}].clockHours`),
    })),
  };
}

function planeCutFields(r: PlaneCutLayout, w: FieldWriters): Record<string, unknown> {
  return {
    angleDeg: w.angle(r.angleDeg, 'angleDeg'),
    cutAngleDeg: w.angle(r.cutAngleDeg, 'cutAngleDeg'),
    gap: w.length(r.gapMm, 'gapMm'),
    fitSurface: String(r.fitSurface),
    stationCount: w.count(r.stations, 'stations'),
    centerCutback: w.length(r.centerCutbackMm, 'centerCutbackMm'),
    gapSetback: w.length(r.gapSetbackMm, 'gapSetbackMm'),
  };
}

function miterFields(r: MiterLayout, w: FieldWriters): Record<string, unknown> {
  return {
    bendDeg: w.angle(r.bendDeg, 'bendDeg'),
    welds: w.count(r.welds, 'welds'),
    cutAngleDeg: w.angle(r.cutAngleDeg, 'cutAngleDeg'),
    radius: w.length(r.radiusMm, 'radiusMm'),
    stockLength: w.length(r.stockLengthMm, 'stockLengthMm'),
    pieces: r.pieces.map((p, i) => ({
      label: String(p.label),
      count: w.count(p.count, `pieces[${i}].count`),
      center: w.length(p.center, `pieces[${i}].center`),
      back: w.length(p.back, `pieces[${i}].back`),
      throat: w.length(p.throat, `pieces[${i}].throat`),
      templateId: String(p.templateId),
    })),
    cuts: r.stock.cuts.map((c, i) => ({
      n: w.count(c.n, `stock.cuts[${i}].n`),
      centerAt: w.length(c.centerAtMm, `stock.cuts[${i}].centerAtMm`),
      longSideDeg: w.angle(c.longSideDeg, `stock.cuts[${i}].longSideDeg`),
      referenceLineAt: w.length(c.referenceLineAtMm, `stock.cuts[${i}].referenceLineAtMm`),
      oppositeLineAt: w.length(c.oppositeLineAtMm, `stock.cuts[${i}].oppositeLineAtMm`),
    })),
    pieceCount: w.count(r.pieceCount, 'pieceCount'),
    tangent: w.length(r.tangentMm, 'tangentMm'),
    fitSurface: String(r.fitSurface),
    stationCount: w.count(r.stations, 'stations'),
    // Written only with a root gap, so elbows without one keep their exact contract.
    ...(r.gapMm > 0 ? { gap: w.length(r.gapMm, 'gapMm') } : {}),
  };
}

function coneFields(r: ConeLayout, w: FieldWriters): Record<string, unknown> {
  const end = (e: ConeLayout['ends']['large'], f: string): Record<string, number> => ({
    givenDiameter: w.length(e.givenDiameterMm, `${f}.givenDiameterMm`),
    meanGirth: w.length(e.meanGirthMm, `${f}.meanGirthMm`),
  });
  const common = {
    form: String(r.form),
    length: w.length(r.lengthMm, 'lengthMm'),
    apexAngleDeg: w.angle(r.apexAngleDeg, 'apexAngleDeg'),
  };
  const tail = {
    diametersAt: String(r.diametersAt),
    thickness: w.length(r.thicknessMm, 'thicknessMm'),
    maxInclinationDeg: w.angle(r.maxInclinationDeg, 'maxInclinationDeg'),
    stationCount: w.count(r.stationCount, 'stationCount'),
    segmentCount: w.count(r.segmentCount, 'segmentCount'),
    ends: { large: end(r.ends.large, 'ends.large'), small: end(r.ends.small, 'ends.small') },
  };
  const piece = (p: ConeLayout['pieces'][number], i: number): Record<string, unknown> => ({
    templateId: String(p.templateId),
    startAngleDeg: w.angle(p.startAngleDeg, `pieces[${i}].startAngleDeg`),
    endAngleDeg: w.angle(p.endAngleDeg, `pieces[${i}].endAngleDeg`),
    width: w.length(p.widthMm, `pieces[${i}].widthMm`),
    height: w.length(p.heightMm, `pieces[${i}].heightMm`),
  });
  if (r.form === 'concentric') {
    const p = r.pattern;
    return {
      ...common,
      pattern: {
        outerRadius: w.length(p.outerRadius, 'pattern.outerRadius'),
        innerRadius: w.length(p.innerRadius, 'pattern.innerRadius'),
        sweepDeg: w.angle(p.sweepDeg, 'pattern.sweepDeg'),
        slantHeight: w.length(p.slantHeight, 'pattern.slantHeight'),
      },
      ...tail,
      pieces: r.pieces.map((q, i) => ({
        ...piece(q, i),
        sweepDeg: w.angle(q.sweepDeg, `pieces[${i}].sweepDeg`),
        center: [w.length(q.centerMm[0], `pieces[${i}].centerMm[0]`), w.length(q.centerMm[1], `pieces[${i}].centerMm[1]`)],
        outerChord: w.length(q.outerChordMm, `pieces[${i}].outerChordMm`),
        outerRise: w.length(q.outerRiseMm, `pieces[${i}].outerRiseMm`),
        innerChord: w.length(q.innerChordMm, `pieces[${i}].innerChordMm`),
        innerRise: w.length(q.innerRiseMm, `pieces[${i}].innerRiseMm`),
      })),
    };
  }
  return {
    ...common,
    ...tail,
    seam: String(r.seam),
    pieces: r.pieces.map(piece),
    outline: {
      chordTolerance: w.length(r.outline.chordToleranceMm, 'outline.chordToleranceMm'),
      subStationsPerStation: w.count(r.outline.subStationsPerStation, 'outline.subStationsPerStation'),
      maxChordError: w.length(r.outline.maxChordErrorMm, 'outline.maxChordErrorMm'),
    },
  };
}

/**
 * The joint's own contract fields, after the common ones; `{}` for a kind this
 * version does not know (a result built by hand).
 */
export function jointFields(result: LayoutResult, w: FieldWriters): Record<string, unknown> {
  switch (result.kind) {
    case 'branch':
      return branchFields(result, w);
    case 'plane-cut':
      return planeCutFields(result, w);
    case 'miter':
      return miterFields(result, w);
    case 'reducer':
      return coneFields(result, w);
    case 'nozzle':
      return nozzleFields(result, w);
    case 'trunnion':
      return trunnionFields(result, w);
    case 'pad':
      return padFields(result, w);
    case 'shell-plate':
      return shellPlateFields(result, w);
    default:
      return {};
  }
}
