/**
 * A reinforcing pad (saddle plate) under a branch on a cylindrical header,
 * developed on the pad's mid-thickness surface as one flat part to cut.
 */
import { DEFAULT_STATIONS, GirthError, requireWithin, STATIONS } from '@girth/pipes';
import { describeBranchJoint } from '../branch/branch-text.js';
import { factLine, lengthFact, textLine, worded } from '../facts.js';
import type { FlatTemplate, PathPart, Point2, StationLine, StationRow, TemplateLabel } from '../types.js';
import { padEdges, signedArea } from './pad-outline.js';
import type { LayoutPadOptions, PadLayout, PadSpec } from './types.js';

/** Diameter of the tell-tale (vent) hole drawn on the mark layer, mm: a 6 mm drill (common practice, recalled; tap 1/4 in NPT where a test connection is wanted). */
export const TELL_TALE_HOLE_MM = 6;

/** Cap height of the pad's labels, mm. */
const LABEL_MM = 5;

/**
 * Lays out a reinforcing pad for a branch on a cylindrical header from the
 * size the user gives (Girth does not size reinforcement). One `flat`
 * template, `reinforcing-pad`, in plate coordinates on the pad's
 * mid-thickness surface: x the girth from the header's top line, y the
 * axial position along the header (0 where the branch axis crosses it), mm.
 *
 * The rule: the pad lies on the header OD (its inside surface) and bends
 * about the header axis, so its mid surface is at radius R + t/2 (R the
 * header OD radius, t the pad thickness). A point of the header OD at girth
 * s (measured on the OD) and axial y goes to girth s · (R + t/2) / R and the
 * same y. The hole (where the branch OD meets the header OD) and the outer
 * edge (at the ring width over the header OD from the hole edge, or the
 * outside diameter over the header OD around the branch axis) are both
 * mapped that way. Cut contours: outer counter-clockwise, hole clockwise.
 * Marks: top line, the header-axis line through the branch, a centre mark,
 * and the tell-tale hole (a 6 mm circle with a cross) in the ring on the
 * heel side, on the header's line through the branch axis, clear of the crotch.
 *
 * Stations: the branch's angles from the heel; columns `holeGirth`,
 * `holeAxial`, `edgeGirth`, `edgeAxial` (mm, on the mid surface): the hole
 * point and the outer edge along the same line from the centre mark.
 *
 * @throws GirthError every error of `padEdges` and `solveBranch`;
 *   `OUT_OF_RANGE` on `stations`; `BAD_OPTION` when `options` is not an object.
 * @example layoutPad({ branch: { header: { odMm: 323.85, wallMm: 9.525 }, branch: { odMm: 168.275, wallMm: 7.112 } }, thicknessMm: 9.525, widthMm: 84 }).templates[0].id // 'reinforcing-pad'
 */
export function layoutPad(spec: PadSpec, options: LayoutPadOptions = {}): PadLayout {
  if (options === null || typeof options !== 'object') {
    throw new GirthError('BAD_OPTION', 'options', 'options: expected { stations, chordToleranceMm }', options);
  }
  const stations = options.stations === undefined ? DEFAULT_STATIONS : requireWithin(options.stations, 'stations', STATIONS);
  const e = padEdges(spec);
  const R = e.headerOd.radius;
  const t = spec.thicknessMm;
  const k = (R + t / 2) / R;
  const mid = (p: Point2): Point2 => [p[0] * k, p[1]];

  const hole = e.hole.map(mid);
  const outer = e.outer.map(mid);
  const centre = mid(e.centre);
  const holeCw = signedArea(hole) > 0 ? [...hole].reverse() : hole;
  const outerCcw = signedArea(outer) < 0 ? [...outer].reverse() : outer;

  // Table rows: at each station angle, the hole point and where the line from the centre through it meets the outer edge.
  const rows: StationRow[] = [];
  const stationLines: StationLine[] = [];
  const step = e.holePhis.length / stations;
  for (let i = 0; i < stations; i++) {
    const phi = (2 * Math.PI * i) / stations;
    const j = e.holePhis.findIndex((p) => Math.abs(p - phi) < 1e-12);
    const h = hole[j >= 0 ? j : Math.round(i * step) % hole.length]!;
    const o = rayHit(centre, h, outer) ?? h;
    const angleDeg = (360 * i) / stations;
    rows.push({ n: i + 1, angleDeg, values: { holeGirth: h[0], holeAxial: h[1], edgeGirth: o[0], edgeAxial: o[1] } });
    stationLines.push({ n: i + 1, angleDeg, from: h, to: o });
  }

  // Tell-tale hole: halfway across the ring at station 1 (the heel side).
  const heel = rows[0]!.values;
  const vent: Point2 = [(heel.holeGirth! + heel.edgeGirth!) / 2, (heel.holeAxial! + heel.edgeAxial!) / 2];
  const r = TELL_TALE_HOLE_MM / 2;
  const xs = outer.map((p) => p[0]);
  const ys = outer.map((p) => p[1]);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const m = 10;
  const arm = 10;
  const marks: PathPart[] = [
    { kind: 'segment', from: [0, minY - m], to: [0, maxY + m] }, // top line
    { kind: 'segment', from: [minX - m, centre[1]], to: [maxX + m, centre[1]] }, // girth line through the branch axis
    { kind: 'segment', from: [centre[0] - arm, centre[1]], to: [centre[0] + arm, centre[1]] },
    { kind: 'segment', from: [centre[0], centre[1] - arm], to: [centre[0], centre[1] + arm] },
    { kind: 'polyline', points: Array.from({ length: 24 }, (_, i) => [vent[0] + r * Math.cos((i * Math.PI) / 12), vent[1] + r * Math.sin((i * Math.PI) / 12)] as Point2), closed: true },
    { kind: 'segment', from: [vent[0] - 2 * r, vent[1]], to: [vent[0] + 2 * r, vent[1]] },
    { kind: 'segment', from: [vent[0], vent[1] - 2 * r], to: [vent[0], vent[1] + 2 * r] },
  ];
  const labels: TemplateLabel[] = [
    { text: 'TOP LINE', at: [0, maxY + m + 2 * LABEL_MM], heightMm: LABEL_MM },
    { text: 'TELL-TALE HOLE', at: [vent[0], vent[1] - 3 * r - LABEL_MM], heightMm: LABEL_MM * 0.6 },
  ];

  const s = e.geometry.spec;
  const given = e.sizedBy === 'width'
    ? factLine`Ring width ${lengthFact(e.widthMm)} over the header OD from the hole edge (given).`
    : factLine`Outside size ${lengthFact(spec.outsideMm ?? 0)} over the header OD, round the branch axis (given); least ring width ${lengthFact(e.widthMm)}.`;
  const text = worded({
    title: factLine`Reinforcing pad: ${describeBranchJoint(s)}`,
    notes: [
      factLine`Pad plate ${lengthFact(t)} thick on header ${s.header.label} (OD ${lengthFact(s.header.odMm)}); hole for branch ${s.branch.label} (OD ${lengthFact(s.branch.odMm)}).`,
      given,
      textLine('Girth does not size reinforcement: the pad size is the one given; check it against the applicable code (ASME B31.3 304.3, B31.1 104.3) and the design.'),
      factLine`Developed on the pad's mid-thickness (radius ${lengthFact(R + t / 2)}): a girth s on the header OD is s x (R + t/2) / R on the plate, axial positions as they are; the hole is where the branch OD meets the header OD, cut square to the plate.`,
      factLine`Tell-tale hole: drill ${lengthFact(TELL_TALE_HOLE_MM)} (or tap 1/4 in NPT) at the mark, on the heel side clear of the crotch; leave it open for the leak test of the branch weld.`,
      textLine('Roll the pad to the header OD with the TOP LINE on the header top line and the cross at the branch axis.'),
      ...e.geometry.warnings.map((w) => textLine(`Warning: ${w.message}`)),
    ],
  });

  const template: FlatTemplate = {
    id: 'reinforcing-pad',
    kind: 'flat',
    ...text,
    cut: [
      { kind: 'polyline', points: outerCcw, closed: true },
      { kind: 'polyline', points: holeCw, closed: true },
    ],
    stationLines,
    marks,
    labels,
    stationColumns: [
      { key: 'holeGirth', heading: 'Hole girth', quantity: 'length' },
      { key: 'holeAxial', heading: 'Hole axial', quantity: 'length' },
      { key: 'edgeGirth', heading: 'Edge girth', quantity: 'length' },
      { key: 'edgeAxial', heading: 'Edge axial', quantity: 'length' },
    ],
    stations: rows,
    development: { surface: 'mid', diameterMm: 2 * R + t, odMm: s.header.odMm, plateThicknessMm: t },
  };
  return {
    kind: 'pad',
    templates: [template],
    pipes: [
      { role: 'header', label: s.header.label, odMm: s.header.odMm, wallMm: s.header.wallMm, idMm: s.header.idMm },
      { role: 'branch', label: s.branch.label, odMm: s.branch.odMm, wallMm: s.branch.wallMm, idMm: s.branch.idMm },
    ],
    warnings: e.geometry.warnings,
    thicknessMm: t,
    sizedBy: e.sizedBy,
    widthMm: e.widthMm,
    midRadiusMm: R + t / 2,
    angleDeg: s.angleDeg,
    stations,
  };
}

/** Where the ray from `c` through `p` leaves the closed polygon `poly` (the first crossing past `p`). */
function rayHit(c: Point2, p: Point2, poly: readonly Point2[]): Point2 | undefined {
  const dx = p[0] - c[0];
  const dy = p[1] - c[1];
  let best: number | undefined;
  for (let i = 0; i < poly.length; i++) {
    const a = poly[i]!;
    const b = poly[(i + 1) % poly.length]!;
    const ex = b[0] - a[0];
    const ey = b[1] - a[1];
    const den = dx * ey - dy * ex;
    if (Math.abs(den) < 1e-15) continue;
    const s = ((a[0] - c[0]) * ey - (a[1] - c[1]) * ex) / den;
    const u = ((a[0] - c[0]) * dy - (a[1] - c[1]) * dx) / den;
    if (s > 1 && u >= 0 && u <= 1 && (best === undefined || s < best)) best = s;
  }
  return best === undefined ? undefined : [c[0] + best * dx, c[1] + best * dy];
}
