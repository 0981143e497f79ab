/**
 * Test oracle for branch joints (tees and laterals, centred or offset, set-on
 * or set-in, with a root gap), written from the stated conventions alone and
 * not from the library's code:
 *
 * - Header axis along x; header surfaces are cylinders about the x axis.
 * - Branch axis direction away from the header `b = (cos A, 0, sin A)`, through
 *   `(0, e, 0)`. Heel direction `u = (-sin A, 0, cos A)` (obtuse side), side
 *   direction `v = (0, 1, 0)`. Generator at phi: `(0, e, 0) + r (cos phi u +
 *   sin phi v) + s b`.
 * - Set-on: branch ID/2 meets header OD/2; set-in: branch OD/2 meets header
 *   ID/2. A root gap g cuts where the distance from the header axis is R + g.
 *   Each generator is cut at its first meeting coming in from +b.
 * - Branch template wraps on the branch OD: girth = (OD/2) phi; cutback =
 *   s(phi) - min s.
 * - Header hole: generators of branch ID (set-on) or OD (set-in) meet header
 *   OD/2; girth = (header OD/2) atan2(y, z), axial = x.
 *
 * Every intersection is found by {@link cutGeneratorAgainstCylinder}
 * (bracketing and bisection), never by a closed form.
 */
import { GirthError } from '@girth/pipes';
import { cutGeneratorAgainstCylinder, type OracleCylinder, type OracleLine } from './generator-cut.js';
import { minimiseUnimodal } from './root-finding.js';
import { combine, dot, sub, type Vec3 } from './vec3.js';

/** A pipe as the oracle needs it: outside diameter and wall, mm. */
export interface OraclePipe {
  readonly odMm: number;
  readonly wallMm: number;
  readonly label?: string;
}

/** A branch joint, in the same shape as the library's input so one object feeds both. */
export interface OracleBranchSpec {
  readonly header: OraclePipe;
  readonly branch: OraclePipe;
  /** Angle between the branch and header axes, degrees, (0, 90]; default 90 (tee). */
  readonly angleDeg?: number;
  /** Sideways offset of the branch axis along +y, mm; default 0. */
  readonly offsetMm?: number;
  /** Default `set-on`. */
  readonly fit?: 'set-on' | 'set-in';
  /** Root gap normal to the header surface, mm; default 0. */
  readonly gapMm?: number;
}

/** The branch's frame: axis point, axis direction `b` (away from the header), heel direction `u`, side direction `v`. */
export interface BranchFrame {
  readonly kind: 'branch-frame';
  readonly axisPointMm: Vec3;
  readonly b: Vec3;
  readonly u: Vec3;
  readonly v: Vec3;
}

/** The radii the joint uses, mm. */
export interface BranchRadii {
  readonly kind: 'branch-radii';
  /** Radius of the branch surface that is cut to fit (ID/2 set-on, OD/2 set-in). */
  readonly cutRadiusMm: number;
  /** Radius about the header axis where that surface is cut: header OD/2 (set-on) or ID/2 (set-in), plus the gap. */
  readonly hostRadiusMm: number;
  /** Radius of the branch surface that marks the hole (same as `cutRadiusMm`). */
  readonly holeRadiusMm: number;
  /** Header OD/2: the surface the hole is marked on. */
  readonly headerOuterRadiusMm: number;
  /** Branch OD/2: the surface the branch template wraps on. */
  readonly wrapRadiusMm: number;
}

/** One station of the branch cut, exact. */
export interface ExactBranchStation {
  readonly n: number;
  readonly angleDeg: number;
  readonly phiRad: number;
  /** Arc length around the branch OD from the heel, mm. */
  readonly girthMm: number;
  /** Parameter of the cut along +b, mm. */
  readonly sMm: number;
  /** `sMm` minus the least s over the whole girth, mm (>= 0). */
  readonly cutbackMm: number;
}

/** One station of the header hole, exact. */
export interface ExactHoleStation {
  readonly n: number;
  readonly angleDeg: number;
  readonly phiRad: number;
  readonly pointMm: Vec3;
  /** Arc length around the header OD from its top line, positive toward +y, mm. */
  readonly girthMm: number;
  /** Position along the header axis (x), mm. */
  readonly axialMm: number;
}

/** The generator that reaches furthest toward the header (the long point). */
export interface LongPoint {
  readonly phiRad: number;
  readonly sMm: number;
}

/**
 * The branch frame for a branch at `angleDeg` to the header, offset `offsetMm` along +y.
 * @param angleDeg (0, 90].
 * @param offsetMm any finite value, mm.
 * @example branchFrame(90, 0).b // [≈0, 0, 1]
 */
export function branchFrame(angleDeg: number, offsetMm: number): BranchFrame {
  const a = (angleDeg * Math.PI) / 180;
  return {
    kind: 'branch-frame',
    axisPointMm: [0, offsetMm, 0],
    b: [Math.cos(a), 0, Math.sin(a)],
    u: [-Math.sin(a), 0, Math.cos(a)],
    v: [0, 1, 0],
  };
}

/**
 * The generator of radius `radiusMm` at station angle `phiRad`, as a line with `s` along +b.
 * @example branchGenerator(branchFrame(90, 0), 50, 0).originMm // [-50, 0, ≈0]
 */
export function branchGenerator(frame: BranchFrame, radiusMm: number, phiRad: number): OracleLine {
  return {
    kind: 'line',
    originMm: combine([
      [1, frame.axisPointMm],
      [radiusMm * Math.cos(phiRad), frame.u],
      [radiusMm * Math.sin(phiRad), frame.v],
    ]),
    direction: frame.b,
  };
}

/**
 * The radii a joint uses, with defaults filled in.
 * @example branchRadii({ header: { odMm: 200, wallMm: 10 }, branch: { odMm: 100, wallMm: 5 } }).cutRadiusMm // 45
 */
export function branchRadii(spec: OracleBranchSpec): BranchRadii {
  const fit = spec.fit ?? 'set-on';
  const gap = spec.gapMm ?? 0;
  const headerOd = spec.header.odMm / 2;
  const headerId = spec.header.odMm / 2 - spec.header.wallMm;
  const branchOd = spec.branch.odMm / 2;
  const branchId = spec.branch.odMm / 2 - spec.branch.wallMm;
  const cut = fit === 'set-on' ? branchId : branchOd;
  return {
    kind: 'branch-radii',
    cutRadiusMm: cut,
    hostRadiusMm: (fit === 'set-on' ? headerOd : headerId) + gap,
    holeRadiusMm: cut,
    headerOuterRadiusMm: headerOd,
    wrapRadiusMm: branchOd,
  };
}

/** The header cylinder of radius `radiusMm` about the x axis. */
function headerCylinder(radiusMm: number): OracleCylinder {
  return { kind: 'cylinder', radiusMm, axisPointMm: [0, 0, 0], axisDirection: [1, 0, 0] };
}

function frameOf(spec: OracleBranchSpec): BranchFrame {
  return branchFrame(spec.angleDeg ?? 90, spec.offsetMm ?? 0);
}

function cutOrThrow(line: OracleLine, hostRadiusMm: number, phiRad: number): { sMm: number; pointMm: Vec3 } {
  const cut = cutGeneratorAgainstCylinder(line, headerCylinder(hostRadiusMm));
  if (cut.kind === 'miss') {
    throw new GirthError(
      'OFFSET_MISSES',
      'offsetMm',
      `oracle: the generator at ${((phiRad * 180) / Math.PI).toFixed(3)}° misses the header surface of radius ${hostRadiusMm} mm (${cut.reason})`,
    );
  }
  return cut;
}

/**
 * Parameter `s` (mm along +b) where the cut generator at `phiRad` is cut.
 * @throws GirthError `OFFSET_MISSES` when that generator misses the header surface.
 * @example branchCutS({ header: { odMm: 200, wallMm: 10 }, branch: { odMm: 100, wallMm: 5 } }, 0) // 100 (tee heel on the header OD)
 */
export function branchCutS(spec: OracleBranchSpec, phiRad: number): number {
  const radii = branchRadii(spec);
  return cutOrThrow(branchGenerator(frameOf(spec), radii.cutRadiusMm, phiRad), radii.hostRadiusMm, phiRad).sMm;
}

/**
 * The long point: the least `s` over the whole girth, from a grid of
 * `gridSize` generators with every local minimum refined by golden section.
 * @param options `gridSize` (default 2048).
 * @throws GirthError `OFFSET_MISSES` when a generator misses the header surface.
 * @example exactLongPoint(tee).phiRad // π/2 or 3π/2 for a centred tee
 */
export function exactLongPoint(spec: OracleBranchSpec, options: { readonly gridSize?: number } = {}): LongPoint {
  const m = options.gridSize ?? 2048;
  const step = (2 * Math.PI) / m;
  const values = Array.from({ length: m }, (_, i) => branchCutS(spec, i * step));
  let best: LongPoint = { phiRad: 0, sMm: Number.POSITIVE_INFINITY };
  for (let i = 0; i < m; i++) {
    const here = values[i]!;
    const before = values[(i + m - 1) % m]!;
    const after = values[(i + 1) % m]!;
    if (here > before || here > after) continue;
    const refined = minimiseUnimodal((phi) => branchCutS(spec, phi), (i - 1) * step, (i + 1) * step, { absTol: 1e-11 });
    const candidate = refined.fx <= here ? { phiRad: refined.x, sMm: refined.fx } : { phiRad: i * step, sMm: here };
    if (candidate.sMm < best.sMm) best = candidate;
  }
  return { phiRad: ((best.phiRad % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI), sMm: best.sMm };
}

/** Station angle (degrees) of 1-based station `n` of `count`: 360 (n - 1) / count. */
export function stationAngleDeg(n: number, count: number): number {
  return (360 * (n - 1)) / count;
}

/**
 * The exact branch-cut stations for `count` equal stations from the heel.
 * @param longPoint the reference for cutbacks; computed when not given.
 * @throws GirthError `OFFSET_MISSES` when a generator misses the header surface.
 * @example exactBranchStations(tee, 16)[0].cutbackMm // the heel's cutback
 */
export function exactBranchStations(spec: OracleBranchSpec, count: number, longPoint?: LongPoint): readonly ExactBranchStation[] {
  const ref = longPoint ?? exactLongPoint(spec);
  const wrap = branchRadii(spec).wrapRadiusMm;
  return Array.from({ length: count }, (_, i) => {
    const angleDeg = stationAngleDeg(i + 1, count);
    const phiRad = (angleDeg * Math.PI) / 180;
    const sMm = branchCutS(spec, phiRad);
    return { n: i + 1, angleDeg, phiRad, girthMm: wrap * phiRad, sMm, cutbackMm: sMm - ref.sMm };
  });
}

/**
 * The exact hole point for the generator at `phiRad`, and its developed position on the header OD.
 * @throws GirthError `OFFSET_MISSES` when that generator misses the header OD.
 * @example exactHolePoint(tee, 0).axialMm // -(branch ID/2) for a centred set-on tee
 */
export function exactHolePoint(spec: OracleBranchSpec, phiRad: number): Omit<ExactHoleStation, 'n' | 'angleDeg'> {
  const radii = branchRadii(spec);
  const cut = cutOrThrow(branchGenerator(frameOf(spec), radii.holeRadiusMm, phiRad), radii.headerOuterRadiusMm, phiRad);
  const [x, y, z] = cut.pointMm;
  return { phiRad, pointMm: cut.pointMm, girthMm: radii.headerOuterRadiusMm * Math.atan2(y, z), axialMm: x };
}

/**
 * The exact header-hole stations for `count` equal stations from the heel.
 * @throws GirthError `OFFSET_MISSES` when a generator misses the header OD.
 * @example exactHoleStations(tee, 16).length // 16
 */
export function exactHoleStations(spec: OracleBranchSpec, count: number): readonly ExactHoleStation[] {
  return Array.from({ length: count }, (_, i) => {
    const angleDeg = stationAngleDeg(i + 1, count);
    return { n: i + 1, angleDeg, ...exactHolePoint(spec, (angleDeg * Math.PI) / 180) };
  });
}

/**
 * Station angle phi (radians, [0, 2π)) of a point, read in the branch frame.
 * @example branchPhiOfPoint(tee, [0, 50, 90]) // π/2
 */
export function branchPhiOfPoint(spec: OracleBranchSpec, pointMm: Vec3): number {
  const frame = frameOf(spec);
  const rel = sub(pointMm, frame.axisPointMm);
  const phi = Math.atan2(dot(rel, frame.v), dot(rel, frame.u));
  return phi < 0 ? phi + 2 * Math.PI : phi;
}

/**
 * How far a developed hole-contour point `(girthMm, axialMm)` lies from the
 * exact hole curve, mm: the point is wrapped back onto the header OD, its
 * station angle read in the branch frame, and its 3D distance to the exact
 * hole point of that generator returned.
 * @throws GirthError `OFFSET_MISSES` when that generator misses the header OD.
 * @example holeContourDistanceMm(tee, 0, -45) // ≈0 for a centred set-on tee with branch ID 90 mm
 */
export function holeContourDistanceMm(spec: OracleBranchSpec, girthMm: number, axialMm: number): number {
  const rOut = branchRadii(spec).headerOuterRadiusMm;
  const theta = girthMm / rOut;
  const p: Vec3 = [axialMm, rOut * Math.sin(theta), rOut * Math.cos(theta)];
  const exact = exactHolePoint(spec, branchPhiOfPoint(spec, p)).pointMm;
  return Math.hypot(p[0] - exact[0], p[1] - exact[1], p[2] - exact[2]);
}
