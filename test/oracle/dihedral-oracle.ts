/**
 * Local dihedral angles of joints, found numerically for the acceptance tests:
 * each member is an implicit surface (a function positive outside the member's
 * wall surface, zero on it), its normal is the gradient by central finite
 * differences, the weld line's direction is the cross product of the two
 * gradients, and the two tangents square to the weld line are built and
 * measured against each other. No closed form of any joint; the points on the
 * weld line come from the oracles' own bisection (branch, plane cut, miter).
 *
 * Definition (AWS D1.1 for tubular connections, recalled; REFERENCES.md):
 * the angle, measured in the plane square to the weld line, between tangents
 * to the outside surfaces of the two members, each tangent leaving the weld
 * line along its member's surface on the outside of the other member.
 */
import { branchCutS, branchFrame, branchGenerator, branchRadii, type OracleBranchSpec } from './branch-oracle.js';
import { pointOnLine } from './generator-cut.js';
import { miterCutAngleRad, miterFitRadiusMm, miterPiece, miterReachMm, type OracleMiterSpec } from './miter-oracle.js';
import { planeCutFitRadiusMm, planeCutFrame, planeCutGenerator, planeCutS, type OraclePlaneCutSpec } from './plane-cut-oracle.js';
import { add, combine, cross, dot, norm, scale, sub, type Vec3 } from './vec3.js';

/** A surface as the zero set of a function of position (mm), positive outside the member. */
export type ImplicitSurface = (pointMm: Vec3) => number;

/** One station's weld point and the two members meeting there, as implicit surfaces. */
export interface OracleWeldPoint {
  readonly pointMm: Vec3;
  /** The cut pipe's outside-of-wall function: distance from its axis less its radius. */
  readonly pipe: ImplicitSurface;
  /** The other member: header cylinder, plane, or the next miter piece. */
  readonly host: ImplicitSurface;
}

const DEG = 180 / Math.PI;

function unit(v: Vec3): Vec3 {
  const n = norm(v);
  if (!(n > 0)) throw new Error('dihedral oracle: zero vector (the surfaces touch tangentially here)');
  return scale(v, 1 / n);
}

/**
 * Gradient of `f` at `p` by central differences with step `hMm` on each axis.
 * @example gradientByDifferences((p) => p[0] * 2, [0, 0, 0], 1e-4) // ≈ [2, 0, 0]
 */
export function gradientByDifferences(f: ImplicitSurface, p: Vec3, hMm: number): Vec3 {
  const d = (axis: 0 | 1 | 2): number => {
    const e: Vec3 = [axis === 0 ? hMm : 0, axis === 1 ? hMm : 0, axis === 2 ? hMm : 0];
    return (f(add(p, e)) - f(sub(p, e))) / (2 * hMm);
  };
  return [d(0), d(1), d(2)];
}

/** Unsigned angle between two vectors, degrees, by atan2 (accurate near 0 and 180). */
function angleDeg(a: Vec3, b: Vec3): number {
  return Math.atan2(norm(cross(a, b)), dot(a, b)) * DEG;
}

/**
 * The two tangents square to the weld line at a weld point: each lies in its
 * member's tangent plane, square to the weld line, and points to the side
 * where the other member's function is positive (outside the other member).
 */
export function weldTangents(w: OracleWeldPoint): { readonly pipe: Vec3; readonly host: Vec3; readonly line: Vec3 } {
  const h = 1e-6 * Math.max(1, norm(w.pointMm));
  const gp = gradientByDifferences(w.pipe, w.pointMm, h);
  const gh = gradientByDifferences(w.host, w.pointMm, h);
  const line = unit(cross(gp, gh));
  const tp = unit(cross(line, gp));
  const th = unit(cross(line, gh));
  return { line, pipe: dot(tp, gh) >= 0 ? tp : scale(tp, -1), host: dot(th, gp) >= 0 ? th : scale(th, -1) };
}

/**
 * Local dihedral angle at a weld point, degrees in [0, 180].
 * @example oracleDihedralDeg(branchWeldPoint(tee, 0)) // ≈ 90 at the crown of a tee
 */
export function oracleDihedralDeg(w: OracleWeldPoint): number {
  const t = weldTangents(w);
  return angleDeg(t.pipe, t.host);
}

function cylinderFunction(axisPoint: Vec3, axis: Vec3, radiusMm: number): ImplicitSurface {
  return (p) => {
    const rel = sub(p, axisPoint);
    return norm(sub(rel, scale(axis, dot(rel, axis)))) - radiusMm;
  };
}

/**
 * The weld point of a branch joint at `phiRad`: where the oracle's cut
 * generator meets the header surface it is cut to; the branch and header as
 * implicit cylinders of those radii.
 * @example branchWeldPoint({ header: { odMm: 300, wallMm: 10 }, branch: { odMm: 100, wallMm: 5 } }, 0).pointMm
 */
export function branchWeldPoint(spec: OracleBranchSpec, phiRad: number): OracleWeldPoint {
  const frame = branchFrame(spec.angleDeg ?? 90, spec.offsetMm ?? 0);
  const radii = branchRadii(spec);
  const pointMm = pointOnLine(branchGenerator(frame, radii.cutRadiusMm, phiRad), branchCutS(spec, phiRad));
  return {
    pointMm,
    pipe: cylinderFunction(frame.axisPointMm, frame.b, radii.cutRadiusMm),
    host: cylinderFunction([0, 0, 0], [1, 0, 0], radii.hostRadiusMm),
  };
}

/**
 * The weld point of a plane cut at `phiRad`: where the fit generator meets the
 * plane (moved by the gap); the plane's function is positive on the pipe's side.
 */
export function planeCutWeldPoint(spec: OraclePlaneCutSpec, phiRad: number): OracleWeldPoint {
  const frame = planeCutFrame(spec);
  const r = planeCutFitRadiusMm(spec);
  const pointMm = pointOnLine(planeCutGenerator(frame, r, phiRad), planeCutS(spec, phiRad));
  const plane = frame.host;
  return {
    pointMm,
    pipe: cylinderFunction(frame.axisPointMm, frame.axis, r),
    host: (p) => dot(sub(p, plane.pointMm), plane.normal),
  };
}

/**
 * The weld point of a miter's first weld at `phiRad` of piece 0's far end,
 * with piece 0 as the pipe and piece 1 as the host.
 */
export function miterWeldPoint(spec: OracleMiterSpec, phiRad: number): OracleWeldPoint {
  const r = miterFitRadiusMm(spec);
  const a = miterPiece(spec, 0);
  const b = miterPiece(spec, 1);
  const pointMm = combine([
    [1, a.tangentPointMm],
    [r * Math.cos(phiRad), a.heel],
    [r * Math.sin(phiRad), a.side],
    [miterReachMm(spec, 0, 'far', phiRad), a.direction],
  ]);
  return { pointMm, pipe: cylinderFunction(a.tangentPointMm, a.direction, r), host: cylinderFunction(b.tangentPointMm, b.direction, r) };
}

/**
 * The dihedral angle between two miter pieces' outsides at a weld point,
 * degrees in (0, 360): measured through the outside, so it passes 180 on the
 * back of the bend. Each tangent runs along its piece away from the weld.
 */
export function oracleMiterDihedralDeg(spec: OracleMiterSpec, phiRad: number): number {
  const w = miterWeldPoint(spec, phiRad);
  const h = 1e-6 * Math.max(1, norm(w.pointMm));
  const g1 = gradientByDifferences(w.pipe, w.pointMm, h);
  const g2 = gradientByDifferences(w.host, w.pointMm, h);
  const line = unit(cross(g1, g2));
  const a = miterPiece(spec, 0);
  const b = miterPiece(spec, 1);
  // Away from the weld: into piece 0 is back along its direction, into piece 1 forward along its.
  const t1raw = unit(cross(line, g1));
  const t2raw = unit(cross(line, g2));
  const t1 = dot(t1raw, a.direction) <= 0 ? t1raw : scale(t1raw, -1);
  const t2 = dot(t2raw, b.direction) >= 0 ? t2raw : scale(t2raw, -1);
  const inner = angleDeg(t1, t2);
  // The outside lies between the tangents when their bisector points out of the pipes.
  return dot(add(t1, t2), g1) >= 0 ? inner : 360 - inner;
}

/** The miter's cut angle c in degrees (oracle's own), for the closed values. */
export function oracleMiterCutDeg(spec: OracleMiterSpec): number {
  return miterCutAngleRad(spec) * DEG;
}
