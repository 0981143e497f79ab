/**
 * Test oracle for miter elbows, built from the definition of the elbow and
 * not from the library's code:
 *
 * - A bend of B degrees in W welds has the cut angle c = B / (2 W) (ASME B31.3
 *   para. 304.2.3: the change of direction at a joint divided by two).
 * - The bend centre is the origin and the bend axis +z. Piece k (0..W) runs
 *   in the direction d_k = (cos 2kc, sin 2kc, 0) along the line that touches
 *   the circle of radius R (the centreline radius) at its tangent point
 *   T_k = R (sin 2kc, -cos 2kc, 0): the middle of a middle piece, the start of
 *   the bend on an end piece.
 * - Weld j (1..W) is the plane through the bend axis whose normal is the
 *   bisector (cos (2j-1)c, sin (2j-1)c, 0) of d_{j-1} and d_j.
 * - A piece's generators: T_k + r (cos phi h_k + sin phi z) + s d_k, with the
 *   heel h_k = -T_k / R toward the bend centre (the throat, phi = 0), r the
 *   fit radius (OD/2, or ID/2 for `id`). A miter is symmetric about the plane
 *   of the bend, so which way phi runs changes no ordinate.
 * - Each cut is where a generator meets its weld plane, found by
 *   {@link cutGeneratorAgainstPlane} (bisection), never by a closed form.
 *   The reach of an end is how far along the piece, from its tangent point and
 *   toward that end, the generator is cut; a square end reaches the tangent
 *   length. A piece's length on a generator is the sum of its two reaches.
 */
import { stationAngleDeg, type OraclePipe } from './branch-oracle.js';
import { cutGeneratorAgainstPlane, type OracleLine, type OraclePlane } from './generator-cut.js';
import { maximiseAroundGirth, type GirthExtreme } from './girth-extreme.js';
import { combine, type Vec3 } from './vec3.js';

/** A miter elbow, in the shape the library accepts (welds and radius in mm), so one object feeds both. */
export interface OracleMiterSpec {
  readonly pipe: OraclePipe;
  /** Total bend, degrees. */
  readonly bendDeg: number;
  /** Number of welds, >= 1. */
  readonly welds: number;
  /** Centreline radius, mm. */
  readonly radiusMm: number;
  /** Straight length beyond the tangent point on each end piece, mm; default 0. */
  readonly tangentMm?: number;
  /** Which pipe surface meets the weld planes; default `od`. */
  readonly fitSurface?: 'od' | 'id';
}

/** One piece in the assembled elbow. */
export interface OracleMiterPiece {
  readonly kind: 'oracle-miter-piece';
  /** 0-based position along the elbow. */
  readonly index: number;
  readonly tangentPointMm: Vec3;
  /** Unit direction from the elbow's start toward its end. */
  readonly direction: Vec3;
  /** Unit vector toward the bend centre (phi = 0, the throat). */
  readonly heel: Vec3;
  /** Unit vector of phi = 90° (the bend axis). */
  readonly side: Vec3;
}

/** Which end of a piece: toward the elbow's start (`near`) or its end (`far`). */
export type PieceEnd = 'near' | 'far';

/** One station of a miter template, exact. Lengths in mm. */
export interface ExactMiterStation {
  readonly n: number;
  readonly angleDeg: number;
  readonly phiRad: number;
  /** Arc length around the OD from the throat. */
  readonly girthMm: number;
  /** The cut end's cutback from its own square line (through its long point). */
  readonly cutbackMm: number;
  /** For a middle piece, the other cut's cutback from its own square line; absent for an end piece. */
  readonly cutbackFarMm?: number;
  /** The piece's length on this generator, between its two ends. */
  readonly lengthMm: number;
}

/** A whole piece's template, exact. */
export interface ExactMiterPieceLayout {
  readonly kind: 'exact-miter-piece';
  readonly index: number;
  readonly stations: readonly ExactMiterStation[];
  /**
   * y of each cut line at `phiRad` on the template (y from the square line of the
   * cut end that the `cutback` column refers to, toward the piece): the cut
   * curves of the template, one per cut end.
   */
  readonly cutCurves: readonly ((phiRad: number) => number)[];
  /** y of the far square line (end piece: the square end; middle piece: the other cut's square line), mm. */
  readonly farSquareLineYMm: number;
  /** y of the square line through the tangent point (the middle of a middle piece), mm. */
  readonly tangentLineYMm: number;
}

/** Lengths of one piece between its ends, mm. */
export interface ExactPieceLengths {
  readonly center: number;
  /** On the fit-surface generator at phi = 180° (the back). */
  readonly back: number;
  /** On the fit-surface generator at phi = 0 (the throat). */
  readonly throat: number;
}

/**
 * Cut angle c = bend / (2 × welds), radians (ASME B31.3 para. 304.2.3).
 * @example miterCutAngleRad({ pipe, bendDeg: 90, welds: 3, radiusMm: 450 }) // π/12
 */
export function miterCutAngleRad(spec: OracleMiterSpec): number {
  return (spec.bendDeg * Math.PI) / 180 / (2 * spec.welds);
}

/**
 * Radius of the generators that meet the weld planes: OD/2, or ID/2 for `id` (mm).
 * @example miterFitRadiusMm({ pipe: { odMm: 100, wallMm: 5 }, bendDeg: 90, welds: 2, radiusMm: 150, fitSurface: 'id' }) // 45
 */
export function miterFitRadiusMm(spec: OracleMiterSpec): number {
  return (spec.fitSurface ?? 'od') === 'id' ? spec.pipe.odMm / 2 - spec.pipe.wallMm : spec.pipe.odMm / 2;
}

/**
 * Piece `index` (0..welds) of the assembled elbow.
 * @throws Error for an index outside 0..welds.
 * @example miterPiece(spec, 0).direction // [1, 0, 0]
 */
export function miterPiece(spec: OracleMiterSpec, index: number): OracleMiterPiece {
  if (!Number.isInteger(index) || index < 0 || index > spec.welds) throw new Error(`miter oracle: no piece ${index} in ${spec.welds} welds`);
  const turn = 2 * index * miterCutAngleRad(spec);
  const r = spec.radiusMm;
  return {
    kind: 'oracle-miter-piece',
    index,
    tangentPointMm: [r * Math.sin(turn), -r * Math.cos(turn), 0],
    direction: [Math.cos(turn), Math.sin(turn), 0],
    heel: [-Math.sin(turn), Math.cos(turn), 0],
    side: [0, 0, 1],
  };
}

/**
 * Weld `j` (1..welds): the plane through the bend axis bisecting pieces j-1 and j.
 * @example miterWeldPlane(spec, 1).normal // [cos c, sin c, 0]
 */
export function miterWeldPlane(spec: OracleMiterSpec, j: number): OraclePlane {
  const a = (2 * j - 1) * miterCutAngleRad(spec);
  return { kind: 'plane', pointMm: [0, 0, 0], normal: [Math.cos(a), Math.sin(a), 0] };
}

function generator(piece: OracleMiterPiece, radiusMm: number, phiRad: number): OracleLine {
  return {
    kind: 'line',
    originMm: combine([
      [1, piece.tangentPointMm],
      [radiusMm * Math.cos(phiRad), piece.heel],
      [radiusMm * Math.sin(phiRad), piece.side],
    ]),
    direction: piece.direction,
  };
}

/**
 * Reach of one end of piece `index` on the generator at `phiRad`: how far from the
 * tangent point, along the piece toward that end, the generator ends (mm). A cut end
 * is found by bisection against its weld plane; a square end (the elbow's two
 * outer ends) reaches the tangent length.
 * @param radiusMm generator radius; default the fit radius; 0 gives the centreline.
 * @throws Error when a generator runs parallel to its weld plane (cut angle 90°).
 * @example miterReachMm(spec, 0, 'far', 0) // (R - r) tan c on the first piece's throat
 */
export function miterReachMm(spec: OracleMiterSpec, index: number, end: PieceEnd, phiRad: number, radiusMm: number = miterFitRadiusMm(spec)): number {
  const weld = end === 'near' ? index : index + 1;
  if (weld < 1 || weld > spec.welds) return spec.tangentMm ?? 0;
  const cut = cutGeneratorAgainstPlane(generator(miterPiece(spec, index), radiusMm, phiRad), miterWeldPlane(spec, weld));
  if (cut.kind === 'miss') throw new Error(`miter oracle: piece ${index} at ${phiRad} rad does not meet weld ${weld} (${cut.reason})`);
  return end === 'near' ? -cut.sMm : cut.sMm;
}

/**
 * The long point of a cut end: the generator of the fit surface reaching furthest toward its weld, found by search.
 * @example miterLongPoint(spec, 0, 'far').phiRad // ≈ π (the back)
 */
export function miterLongPoint(spec: OracleMiterSpec, index: number, end: PieceEnd): GirthExtreme {
  return maximiseAroundGirth((phi) => miterReachMm(spec, index, end, phi));
}

/**
 * Lengths of piece `index` on the centreline, the back and the throat (mm).
 * @example exactPieceLengths(spec, 1).center // 2 R tan c for a middle piece
 */
export function exactPieceLengths(spec: OracleMiterSpec, index: number): ExactPieceLengths {
  const at = (phi: number, radiusMm?: number): number =>
    miterReachMm(spec, index, 'near', phi, radiusMm) + miterReachMm(spec, index, 'far', phi, radiusMm);
  return { center: at(0, 0), back: at(Math.PI), throat: at(0) };
}

/**
 * The exact template of piece `index`, `count` stations from the throat.
 *
 * An end piece has one cut; its `cutback` is from the square line through that
 * cut's long point, `length` from the square end, and the square end lies at
 * y = cutback + length. A middle piece is read from its near end: `cutback`
 * (near) and `cutbackFar` each from their own square line, the near cut at
 * y = cutback and the far cut at y = S - cutbackFar, S the distance between the
 * two square lines.
 *
 * @throws Error when a generator runs parallel to its weld plane.
 * @example exactMiterPiece(spec, 0, 16).stations[8]?.cutbackMm // ≈ 0 (the back)
 */
export function exactMiterPiece(spec: OracleMiterSpec, index: number, count: number): ExactMiterPieceLayout {
  const wrapRadiusMm = spec.pipe.odMm / 2;
  const isEnd = index === 0 || index === spec.welds;
  // The cut end the template's `cutback` column refers to: an end piece's only cut, a middle piece's near cut.
  const first: PieceEnd = index === 0 ? 'far' : 'near';
  const second: PieceEnd = first === 'far' ? 'near' : 'far';
  const firstLong = miterLongPoint(spec, index, first);
  const secondLong = isEnd ? undefined : miterLongPoint(spec, index, second);
  const cutback = (end: PieceEnd, long: GirthExtreme, phi: number): number => long.value - miterReachMm(spec, index, end, phi);
  const squareLinesApartMm = firstLong.value + (secondLong ? secondLong.value : (spec.tangentMm ?? 0));
  const stations = Array.from({ length: count }, (_, i): ExactMiterStation => {
    const angleDeg = stationAngleDeg(i + 1, count);
    const phiRad = (angleDeg * Math.PI) / 180;
    const lengthMm = miterReachMm(spec, index, first, phiRad) + miterReachMm(spec, index, second, phiRad);
    const base = { n: i + 1, angleDeg, phiRad, girthMm: wrapRadiusMm * phiRad, cutbackMm: cutback(first, firstLong, phiRad), lengthMm };
    return secondLong ? { ...base, cutbackFarMm: cutback(second, secondLong, phiRad) } : base;
  });
  const cutCurves = [
    (phi: number): number => cutback(first, firstLong, phi),
    ...(secondLong ? [(phi: number): number => squareLinesApartMm - cutback(second, secondLong, phi)] : []),
  ];
  return { kind: 'exact-miter-piece', index, stations, cutCurves, farSquareLineYMm: squareLinesApartMm, tangentLineYMm: firstLong.value };
}
