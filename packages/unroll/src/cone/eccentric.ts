/**
 * Eccentric reducer: the flat pattern of a cone with one side flat, developed
 * by triangulation.
 */
import { frustumNormal, norm, sheetElement, sub, type ConeElement, type Vec3 } from '@girth/geometry';
import type { PathPart, Point2, StationLine, StationRow, Template, TemplateLabel } from '../types.js';
import { angleFact, factLine, lengthFact, textLine, worded, type FactLine } from '../facts.js';
import { coneTitle, commonConeNotes, CONE_LABEL_HEIGHT_MM } from './internal/cone-text.js';
import { coneResultBase } from './internal/cone-result.js';
import { boundsOfPoints, movePoint, toPlateOrigin, uprightRotation } from './internal/plate-frame.js';
import { resolveCone, resolveEccentricOptions, type ResolvedCone } from './internal/resolve-cone.js';
import { subStationsPerStation } from './internal/sub-stations.js';
import type { ConePiece, EccentricConeLayout, EccentricConeOptions, EccentricConeSpec } from './types.js';
import { unfoldStrip } from './unfold-strip.js';
import { requireConeWithinReach } from './internal/cone-reach.js';

const TWO_PI = 2 * Math.PI;

/**
 * The flat pattern of an eccentric reducer (one side flat: its element runs
 * parallel to the axis, so the pipes it joins share that side's line).
 *
 * Triangulation (F. S. Kidder, 1920; B. Coey, Pattern Development: Sheet Metal
 * Level 1, 2021): both end edges of the mean surface (see `makeConeSheet`) are
 * divided into N stations; elements join matching stations and diagonals join
 * each large-end station to the next small-end station; the triangles are laid
 * into the plane one after another from their true lengths. The outline is
 * the same triangulation carried on through an even number of sub-stations per
 * station, enough that no straight run of it stands more than
 * `chordToleranceMm` off the true end curve and that the drawn edge falls short
 * of the true girth by less than that; every sub-station point is exact.
 *
 * Each piece is one closed `polyline` (large edge from the first seam edge to
 * the other, then the small edge back), turned so its middle element stands
 * upright with the large edge on top, as seen from the outside of the cone,
 * and placed with its bounding rectangle from (0, 0). Station lines are the
 * elements at the stations (station 1 on the seam, numbers rising to the
 * left); the flat side, when it lies inside a piece, is marked and labelled.
 * Columns (mm): `element` (true length), `largeGirth` and `smallGirth` (along
 * the drawn edges from the piece's first edge), and for the bay before the
 * station (absent on a piece's first row): `diagonal` (large end of the
 * previous station to small end of this one), `largeStep` and `smallStep`
 * (straight distances between the two stations on each end).
 *
 * @param spec diameters, length or apex angle (flat side to opposite element), plate thickness.
 * @param options stations (4..360, default 16), segments (dividing the
 *   stations), seam (`flat-side` default, or `opposite`), chordToleranceMm
 *   (0.001..5, default 0.05), formatLength.
 * @throws GirthError as `resolveCone` (`OUT_OF_RANGE`, `NEGATIVE`,
 *   `BAD_OPTION`, `WALL_TOO_THICK`, `NOT_A_NUMBER`, `NOT_FINITE`), and
 *   `BAD_OPTION` for an unknown seam.
 * @example
 * const r = layoutEccentricCone({ largeDiameterMm: 219.1, smallDiameterMm: 114.3, lengthMm: 178, thicknessMm: 0 });
 * r.templates[0]?.stations[0]?.values.element // 178: the flat side (seam on it)
 */
export function layoutEccentricCone(spec: EccentricConeSpec, options: EccentricConeOptions = {}): EccentricConeLayout {
  const cone = resolveCone(spec, options, 'eccentric');
  const { seam, chordToleranceMm } = resolveEccentricOptions(options);
  const N = cone.stations;
  const k = cone.segments;
  const q = N / k;
  const m = subStationsPerStation(cone, chordToleranceMm);
  const stepRad = TWO_PI / (N * m);
  const seamRad = seam === 'flat-side' ? 0 : Math.PI;
  const flatIndex = seam === 'flat-side' ? 0 : (N * m) / 2; // grid index of the flat side from the seam
  const thetaAt = (index: number): number => seamRad + index * stepRad;

  const { large: largeGirth, small: smallGirth } = endCurveLengths(cone, N * m);
  const common = commonConeNotes(cone, largeGirth, smallGirth);
  const flatEl = sheetElement(cone.sheet, 0);
  const oppositeEl = sheetElement(cone.sheet, Math.PI);

  // First pass: the 3D elements of every piece, and how far the straight runs stand off the true edges.
  const strips = Array.from({ length: k }, (_, j) => {
    const first = j * q * m;
    const elements: ConeElement[] = [];
    for (let i = 0; i <= q * m; i++) elements.push(sheetElement(cone.sheet, thetaAt(first + i)));
    return { first, A: elements.map((e) => e.large), B: elements.map((e) => e.small) };
  });
  let maxChordErrorMm = 0;
  for (const { first, A, B } of strips) {
    for (let i = 0; i + 1 < A.length; i++) {
      const mid = sheetElement(cone.sheet, thetaAt(first + i + 0.5));
      maxChordErrorMm = Math.max(
        maxChordErrorMm,
        distanceToSegment3(mid.large, A[i] as Vec3, A[i + 1] as Vec3),
        distanceToSegment3(mid.small, B[i] as Vec3, B[i + 1] as Vec3),
      );
    }
  }

  const pieces: ConePiece[] = [];
  const templates: Template[] = [];
  strips.forEach(({ first, A, B }, j) => {
    const strip = unfoldStrip(A, B, frustumNormal(cone.given, thetaAt(first)));
    const midIndex = (q * m) / 2;
    const turn = uprightRotation(strip.small[midIndex] as Point2, strip.large[midIndex] as Point2);
    const turnedLarge = strip.large.map((p) => movePoint(p, turn));
    const turnedSmall = strip.small.map((p) => movePoint(p, turn));
    const bounds = boundsOfPoints([...turnedLarge, ...turnedSmall]);
    const shift = toPlateOrigin({ cos: 1, sin: 0, dx: 0, dy: 0 }, bounds);
    const large = turnedLarge.map((p) => movePoint(p, shift));
    const small = turnedSmall.map((p) => movePoint(p, shift));
    const largeAlong = cumulative(A);
    const smallAlong = cumulative(B);

    const stationLines: StationLine[] = [];
    const stations: StationRow[] = [];
    for (let s = 0; s <= q; s++) {
      const idx = s * m;
      const g = j * q + s;
      const angleDeg = (g * 360) / N;
      const a = A[idx] as Vec3;
      const b = B[idx] as Vec3;
      const values: Record<string, number> = {
        element: dist(a, b),
        largeGirth: largeAlong[idx] as number,
        smallGirth: smallAlong[idx] as number,
      };
      if (s > 0) {
        const prev = idx - m;
        values.diagonal = dist(A[prev] as Vec3, b);
        values.largeStep = dist(A[prev] as Vec3, a);
        values.smallStep = dist(B[prev] as Vec3, b);
      }
      stations.push({ n: g + 1, angleDeg, values });
      stationLines.push({ n: g + 1, angleDeg, from: large[idx] as Point2, to: small[idx] as Point2 });
    }

    // A label on the element at `idx`, `along` of the way from the large end, set off toward the middle of the piece.
    const middleX = ((large[midIndex] as Point2)[0] + (small[midIndex] as Point2)[0]) / 2;
    const labelAt = (idx: number, along: number): Point2 => {
      const p = large[idx] as Point2;
      const r = small[idx] as Point2;
      const x = p[0] + (r[0] - p[0]) * along;
      const toward = Math.sign(middleX - x) || 1;
      return [x + toward * 1.5 * CONE_LABEL_HEIGHT_MM, p[1] + (r[1] - p[1]) * along];
    };
    const labels: TemplateLabel[] = [
      { text: 'SEAM', at: labelAt(0, 0.5), heightMm: CONE_LABEL_HEIGHT_MM },
      { text: 'SEAM', at: labelAt(q * m, 0.5), heightMm: CONE_LABEL_HEIGHT_MM },
    ];
    const marks: PathPart[] = [];
    for (const flat of [flatIndex, flatIndex + N * m]) {
      const local = flat - first;
      if (local < 0 || local > q * m) continue;
      labels.push({ text: 'FLAT SIDE', at: labelAt(local, 0.3), heightMm: CONE_LABEL_HEIGHT_MM });
      if (local % m !== 0) marks.push({ kind: 'segment', from: large[local] as Point2, to: small[local] as Point2 });
    }

    const piece: ConePiece = {
      templateId: k === 1 ? 'cone-pattern' : `cone-pattern-${j + 1}`,
      startAngleDeg: (j * 360) / k,
      endAngleDeg: ((j + 1) * 360) / k,
      widthMm: bounds.maxX - bounds.minX,
      heightMm: bounds.maxY - bounds.minY,
    };
    pieces.push(piece);
    templates.push({
      id: piece.templateId,
      kind: 'flat',
      ...worded({
        title: textLine(coneTitle(cone, j)),
        notes: eccentricNotes(cone, common, piece, j, {
          m,
          seamOnFlat: seam === 'flat-side',
          flatMm: dist(flatEl.large, flatEl.small),
          oppositeMm: dist(oppositeEl.large, oppositeEl.small),
          maxChordErrorMm,
        }),
      }),
      cut: [{ kind: 'polyline', points: [...large, ...[...small].reverse()], closed: true }],
      stationLines,
      marks,
      labels,
      stationColumns: [
        { key: 'element', heading: 'Element', quantity: 'length' },
        { key: 'largeGirth', heading: 'Large girth', quantity: 'length' },
        { key: 'smallGirth', heading: 'Small girth', quantity: 'length' },
        { key: 'diagonal', heading: 'Diagonal', quantity: 'length' },
        { key: 'largeStep', heading: 'Large step', quantity: 'length' },
        { key: 'smallStep', heading: 'Small step', quantity: 'length' },
      ],
      stations,
    });
  });

  requireConeWithinReach(spec, templates);
  return {
    ...coneResultBase(cone, N, k, { large: largeGirth, small: smallGirth }, templates),
    form: 'eccentric',
    seam,
    pieces,
    outline: { chordToleranceMm, subStationsPerStation: m, maxChordErrorMm },
  };
}

function eccentricNotes(
  cone: ResolvedCone,
  common: readonly FactLine[],
  piece: ConePiece,
  j: number,
  x: {
    readonly m: number;
    readonly seamOnFlat: boolean;
    readonly flatMm: number;
    readonly oppositeMm: number;
    readonly maxChordErrorMm: number;
  },
): readonly FactLine[] {
  const N = cone.stations;
  return [
    ...common,
    factLine`Flat side: element ${lengthFact(x.flatMm)}, parallel to the axis; opposite element ${lengthFact(x.oppositeMm)}. ${
      x.seamOnFlat ? 'Seam on the flat side.' : 'Seam opposite the flat side, on the longest element.'
    }`,
    ...(cone.segments > 1 ? [factLine`Piece ${j + 1} of ${cone.segments}: from ${angleFact(piece.startAngleDeg, 2)} to ${angleFact(piece.endAngleDeg, 2)} around the cone from the seam.`] : []),
    factLine`Triangulated in ${N} stations (every ${angleFact(360 / N, 2)}): elements join matching stations, diagonals run from each large-end station ${
      'to the next small-end station; true lengths in the table.'
    } Outline through ${x.m} sub-stations per station, within ${lengthFact(x.maxChordErrorMm)} of the true edge.`,
    factLine`Plate ${lengthFact(piece.widthMm)} x ${lengthFact(piece.heightMm)}. Station 1 on the seam, numbers rising to the left (seen from outside).`,
  ];
}

function dist(a: Vec3, b: Vec3): number {
  return norm(sub(a, b));
}

/** Running length along a 3D polyline, from its first point. */
function cumulative(points: readonly Vec3[]): readonly number[] {
  const out = [0];
  for (let i = 1; i < points.length; i++) out.push((out[i - 1] as number) + dist(points[i - 1] as Vec3, points[i] as Vec3));
  return out;
}

function distanceToSegment3(p: Vec3, a: Vec3, b: Vec3): number {
  const ab = sub(b, a);
  const ap = sub(p, a);
  const ll = ab[0] * ab[0] + ab[1] * ab[1] + ab[2] * ab[2];
  let s = ll === 0 ? 0 : (ap[0] * ab[0] + ap[1] * ab[1] + ap[2] * ab[2]) / ll;
  s = Math.min(1, Math.max(0, s));
  return norm([ap[0] - s * ab[0], ap[1] - s * ab[1], ap[2] - s * ab[2]]);
}

/**
 * Lengths of the large and small end curves of the mean surface (mm), by
 * chords at `runs` and 2 × `runs` equal steps and Richardson's extrapolation
 * (error of order runs⁻⁴). One sweep of 2 × `runs` elements serves both ends
 * and both step counts: the angle 2π · 2i / (2 runs) is, to the bit, 2π · i / runs.
 */
function endCurveLengths(cone: ResolvedCone, runs: number): { readonly large: number; readonly small: number } {
  const fineRuns = 2 * runs;
  const elements: ConeElement[] = [];
  for (let i = 0; i <= fineRuns; i++) elements.push(sheetElement(cone.sheet, (TWO_PI * i) / fineRuns));
  const chords = (pick: (e: ConeElement) => Vec3, stride: number): number => {
    let sum = 0;
    let prev = pick(elements[0] as ConeElement);
    for (let i = stride; i <= fineRuns; i += stride) {
      const p = pick(elements[i] as ConeElement);
      sum += dist(prev, p);
      prev = p;
    }
    return sum;
  };
  const richardson = (pick: (e: ConeElement) => Vec3): number => (4 * chords(pick, 1) - chords(pick, 2)) / 3;
  return { large: richardson((e) => e.large), small: richardson((e) => e.small) };
}
