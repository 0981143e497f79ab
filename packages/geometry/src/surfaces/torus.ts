/**
 * Host kind `torus`: the body of an elbow (a pipe of tube radius r bent on a
 * centreline radius R), and any surface parallel to it (inside, outside, a
 * root gap away). The surface is the whole ring; a joint keeps its work
 * within the elbow's bend.
 */
import { GirthError } from '@girth/pipes';
import type { Line3 } from '../types.js';
import { cross, dot, type Vec3 } from '../vec3.js';
import type { LineRoot, SurfaceOps } from './types.js';

/**
 * A torus: the circle of radius `tubeRadiusMm` (square to the bend, about the
 * centreline) swept about the bend axis at `bendRadiusMm` from it. Outside is
 * away from the centreline. Lengths in mm.
 */
export interface TorusSurface {
  readonly kind: 'torus';
  /** Centre of the bend (the centre of the centreline's circle), mm. */
  readonly centre: Vec3;
  /** Unit vector along the bend axis, square to the plane of the bend. */
  readonly axisDirection: Vec3;
  /** Unit vector square to the axis from the centre toward where the bend starts (bend angle 0). */
  readonly zeroDirection: Vec3;
  /** Centreline radius of the bend, mm, > tube radius. */
  readonly bendRadiusMm: number;
  /** Radius of the tube of this surface, mm, > 0 (OD / 2 for the outside, ID / 2 for the inside). */
  readonly tubeRadiusMm: number;
}

/** A point on (or near) a torus in its own frame. */
export interface TorusLocalPoint {
  /** Angle along the bend from its start, radians in (−π, π], growing toward axisDirection × zeroDirection. */
  readonly bendRad: number;
  /**
   * Angle around the tube's cross-section from the extrados (the side away
   * from the bend centre), radians in (−π, π], growing toward axisDirection;
   * ±π is the intrados.
   */
  readonly aroundRad: number;
  /** Distance from the centreline, mm. */
  readonly fromCentrelineMm: number;
}

/**
 * `point` in the torus's own frame.
 * @example torusLocal(elbow, [R + r, 0, 0]) // { bendRad: 0, aroundRad: 0, fromCentrelineMm: r } for an elbow about +z, zero direction +x
 */
export function torusLocal(s: TorusSurface, point: Vec3): TorusLocalPoint {
  const a = s.axisDirection;
  const zero = s.zeroDirection;
  const side = cross(a, zero);
  const w: Vec3 = [point[0] - s.centre[0], point[1] - s.centre[1], point[2] - s.centre[2]];
  const x = dot(w, zero);
  const y = dot(w, side);
  const z = dot(w, a);
  const rho = Math.hypot(x, y);
  return { bendRad: Math.atan2(y, x), aroundRad: Math.atan2(z, rho - s.bendRadiusMm), fromCentrelineMm: Math.hypot(rho - s.bendRadiusMm, z) };
}

/**
 * The point of `s` at bend angle `bendRad` and angle `aroundRad` around the
 * tube from the extrados (see {@link TorusLocalPoint}), mm.
 * @example torusPoint(elbow, Math.PI / 4, 0) // on the extrados half way round a 90° elbow
 */
export function torusPoint(s: TorusSurface, bendRad: number, aroundRad: number): Vec3 {
  const side = cross(s.axisDirection, s.zeroDirection);
  const rho = s.bendRadiusMm + s.tubeRadiusMm * Math.cos(aroundRad);
  const z = s.tubeRadiusMm * Math.sin(aroundRad);
  const c = Math.cos(bendRad);
  const sn = Math.sin(bendRad);
  return [0, 1, 2].map((i) => s.centre[i]! + rho * (c * s.zeroDirection[i]! + sn * side[i]!) + z * s.axisDirection[i]!) as unknown as Vec3;
}

/** Most steps of the root refinement on a bracket (bisection with regula falsi; a few dozen in practice). */
const MAX_REFINE_STEPS = 200;

/**
 * The real roots of the polynomial `c` (c[0] + c[1] t + … , any degree ≥ 1)
 * in [lo, hi], ascending: the roots of its derivative split the interval into
 * pieces on which it is monotone, and each piece whose ends differ in sign
 * holds one root, refined to the last bits. Roots of even multiplicity (a
 * touch without a sign change) are not listed; they are critical points of
 * the derivative's list.
 */
function monotoneRoots(c: readonly number[], lo: number, hi: number): number[] {
  const degree = c.length - 1;
  const p = (t: number): number => {
    let v = 0;
    for (let i = degree; i >= 0; i--) v = v * t + c[i]!;
    return v;
  };
  if (degree === 1) {
    const t = -c[0]! / c[1]!;
    return t >= lo && t <= hi && Number.isFinite(t) ? [t] : [];
  }
  const derivative = c.slice(1).map((v, i) => v * (i + 1));
  const cuts = [lo, ...monotoneRoots(derivative, lo, hi), hi];
  const out: number[] = [];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const a = cuts[i]!;
    const b = cuts[i + 1]!;
    const fa = p(a);
    const fb = p(b);
    if (fa === 0) out.push(a);
    else if (fa > 0 !== fb > 0 && fb !== 0) out.push(refine(p, a, fa, b, fb));
  }
  if (p(hi) === 0) out.push(hi);
  return out;
}

/** The root of f in [a, b] where f(a), f(b) differ in sign: regula falsi (Illinois) with a bisection every 8th step. */
function refine(f: (t: number) => number, a: number, fa: number, b: number, fb: number): number {
  let wa = fa;
  let wb = fb;
  let side = 0;
  for (let i = 0; i < MAX_REFINE_STEPS; i++) {
    let t = (a * wb - b * wa) / (wb - wa);
    if (!(t > Math.min(a, b) && t < Math.max(a, b)) || i % 8 === 7) t = a + (b - a) / 2;
    if (t === a || t === b) break;
    const ft = f(t);
    if (ft === 0) return t;
    if (ft > 0 === fa > 0) {
      a = t;
      fa = ft;
      wa = ft;
      if (side === -1) wb /= 2;
      side = -1;
    } else {
      b = t;
      fb = ft;
      wb = ft;
      if (side === 1) wa /= 2;
      side = 1;
    }
    if (Math.abs(b - a) <= 4 * Number.EPSILON * Math.max(Math.abs(a), Math.abs(b), 1)) break;
  }
  return Math.abs(fa) <= Math.abs(fb) ? a : b;
}

/**
 * Where a line meets a torus. The quartic (|p|² + R² − r²)² − 4R²ρ² = 0 in
 * the line parameter (ρ the distance from the bend axis) has the sign of the
 * signed distance g = √((ρ − R)² + z²) − r (the other factor,
 * (ρ + R)² + z² − r², is positive for R > r). The quartic's critical points
 * (the roots of its cubic derivative, found the same way from the quadratic
 * below it) cut the line into at most four monotone pieces; a piece whose ends
 * differ in sign of g holds one root, refined on g (well conditioned, unlike
 * the expanded quartic). A critical point where |g| ≤ eps × r / 2 is a touch:
 * one tangent root, in place of the two nearby crossings.
 */
function intersectLine(s: TorusSurface, line: Line3, eps: number): readonly LineRoot[] {
  const a = s.axisDirection;
  const R = s.bendRadiusMm;
  const r = s.tubeRadiusMm;
  const o: Vec3 = [line.origin[0] - s.centre[0], line.origin[1] - s.centre[1], line.origin[2] - s.centre[2]];
  const d = line.direction;
  const dd = dot(d, d);
  const b = dot(o, d);
  const oo = dot(o, o);
  // Only |p| ≤ R + r can be on the torus.
  const reach = R + r;
  const disc = b * b - dd * (oo - reach * reach);
  if (!(disc > 0)) return [];
  const half = Math.sqrt(disc) / dd;
  const margin = 1e-9 * reach;
  const lo = -b / dd - half - margin;
  const hi = -b / dd + half + margin;
  // Expand about the bracket's middle for conditioning: t = m + u.
  const m = -b / dd;
  const q: Vec3 = [o[0] + m * d[0], o[1] + m * d[1], o[2] + m * d[2]];
  const qz = dot(q, a);
  const dz = dot(d, a);
  const qd = dot(q, d);
  const qq = dot(q, q);
  // S(u) = |p|² + R² − r² = dd u² + 2 qd u + (qq + R² − r²); ρ²(u) = (dd − dz²) u² + 2 (qd − qz dz) u + (qq − qz²).
  const s0 = qq + R * R - r * r;
  const s1 = 2 * qd;
  const s2 = dd;
  const k = 4 * R * R;
  const p0 = s0 * s0 - k * (qq - qz * qz);
  const p1 = 2 * s0 * s1 - k * 2 * (qd - qz * dz);
  const p2 = s1 * s1 + 2 * s0 * s2 - k * (dd - dz * dz);
  const p3 = 2 * s1 * s2;
  const p4 = s2 * s2;
  const g = (u: number): number => {
    const x = q[0] + u * d[0] - (qz + u * dz) * a[0];
    const y = q[1] + u * d[1] - (qz + u * dz) * a[1];
    const w = q[2] + u * d[2] - (qz + u * dz) * a[2];
    const rho = Math.sqrt(x * x + y * y + w * w);
    return Math.hypot(rho - R, qz + u * dz) - r;
  };
  const tol = (eps * r) / 2;
  const ulo = lo - m;
  const uhi = hi - m;
  const criticals = monotoneRoots([p1, 2 * p2, 3 * p3, 4 * p4], ulo, uhi);
  // Points along the line with the sign of g there: 0 for a touch.
  const pts: { u: number; g: number; touch: boolean }[] = [{ u: ulo, g: g(ulo), touch: false }];
  for (const u of criticals) {
    const gu = g(u);
    pts.push({ u, g: gu, touch: Math.abs(gu) <= tol });
  }
  pts.push({ u: uhi, g: g(uhi), touch: false });
  const roots: LineRoot[] = [];
  for (let i = 0; i < pts.length; i++) {
    const here = pts[i]!;
    if (here.touch) {
      roots.push({ tMm: m + here.u, tangent: true });
      continue;
    }
    const next = pts[i + 1];
    if (next === undefined || next.touch) continue;
    if (here.g > 0 !== next.g > 0) roots.push({ tMm: m + refine(g, here.u, here.g, next.u, next.g), tangent: false });
  }
  return roots;
}

function offset(s: TorusSurface, distanceMm: number): TorusSurface {
  const tubeRadiusMm = s.tubeRadiusMm + distanceMm;
  if (!(tubeRadiusMm > 0) || !(tubeRadiusMm < s.bendRadiusMm)) {
    throw new GirthError(
      'OUT_OF_RANGE',
      'gap',
      `gap: an offset of ${distanceMm} mm leaves an elbow tube radius of ${tubeRadiusMm} mm; it must be above 0 and below the bend radius ${s.bendRadiusMm} mm`,
      distanceMm,
    );
  }
  return { ...s, tubeRadiusMm };
}

function normal(s: TorusSurface, point: Vec3): Vec3 {
  const a = s.axisDirection;
  const w: Vec3 = [point[0] - s.centre[0], point[1] - s.centre[1], point[2] - s.centre[2]];
  const z = dot(w, a);
  const h: Vec3 = [w[0] - z * a[0], w[1] - z * a[1], w[2] - z * a[2]];
  const rho = Math.hypot(h[0], h[1], h[2]);
  const k = rho > 0 ? s.bendRadiusMm / rho : 0;
  const n: Vec3 = [w[0] - k * h[0], w[1] - k * h[1], w[2] - k * h[2]];
  const len = Math.hypot(n[0], n[1], n[2]);
  return [n[0] / len, n[1] / len, n[2] / len];
}

/**
 * The operations of host kind `torus`: every root of the line's quartic (see
 * the file), the parallel torus (tube radius moved; refused at 0 or at the
 * bend radius) and the normal (from the nearest point of the centreline). A
 * torus does not develop.
 * @example torusOps.normal(elbow, torusPoint(elbow, 0.5, 0)) // the extrados's outward normal
 */
export const torusOps: SurfaceOps<TorusSurface> = { intersectLine, offset, normal };

/** Where a point on an elbow lies, as a layout person measures it with a tape from the start end's extrados. */
export interface TorusTapePosition {
  /** Length around the tube's cross-section (a meridian circle) from the extrados, mm, signed as `aroundRad`. */
  readonly aroundMm: number;
  /** Length along the bend on the point's parallel (the circle about the bend axis through it) from the start end, mm. */
  readonly alongMm: number;
  /** Radius of the point's parallel, mm: R + r cos(around). */
  readonly parallelRadiusMm: number;
}

/**
 * The tape position of `point` (on `s`): around the start end's circle from
 * the extrados (r × angle; a meridian of a surface of revolution is a
 * geodesic, so a tape held on it reads this), then along the bend on the
 * parallel (radius × bend angle; a parallel is not a geodesic except at the
 * extrados and intrados, see `parallelTapeShortfallMm`).
 * @example torusTapePosition(elbow, torusPoint(elbow, Math.PI / 4, 0)).alongMm // (R + r) π / 4
 */
export function torusTapePosition(s: TorusSurface, point: Vec3): TorusTapePosition {
  const l = torusLocal(s, point);
  const parallelRadiusMm = s.bendRadiusMm + s.tubeRadiusMm * Math.cos(l.aroundRad);
  return { aroundMm: s.tubeRadiusMm * l.aroundRad, alongMm: parallelRadiusMm * l.bendRad, parallelRadiusMm };
}
