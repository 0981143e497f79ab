/**
 * What the dished heads (hemispherical, ellipsoidal, torispherical) share: a
 * convex profile turned about the vessel axis, continued below the tangent
 * line by the straight flange and the shell (a cylinder of the same
 * diameter), and any surface parallel to it (the head's inside and outside
 * are one profile moved by the wall). Each head kind gives only the signed
 * distance from a point of its meridian half-plane to its profile; the line
 * intersection, offset and normal are the same for all of them.
 */
import { GirthError } from '@girth/pipes';
import type { Line3 } from '../types.js';
import { addScaled, cross, dot, type Vec3 } from '../vec3.js';
import type { LineRoot, SurfaceOps } from './types.js';

/**
 * The frame and wall position every head surface has. The head's profile is
 * given on its inside surface (as ASME Section VIII Div. 1 UG-32 gives a
 * head's inside radii and depth, recalled); `offsetMm` moves it outward by
 * that much along its normal (the wall to the outside surface, a root gap).
 * Lengths in mm.
 */
export interface HeadSurfaceBase {
  /** The centre of the tangent line (the circle where the dish meets the straight flange), mm. */
  readonly axisPoint: Vec3;
  /** Unit vector along the vessel axis, from the tangent line out through the crown. */
  readonly axisDirection: Vec3;
  /**
   * Unit vector square to the axis toward the reference meridian, from which
   * the angle around the head is measured. When left out: the part of +x
   * square to the axis, or +y when the axis lies along x.
   */
  readonly zeroDirection?: Vec3;
  /** Distance of this surface from the profile (the head's inside), mm, outward positive: 0 for the inside, the wall for the outside. */
  readonly offsetMm: number;
  /** Length of the straight flange below the tangent line, mm, ≥ 0. The cylinder goes on below it as the shell of the same size. */
  readonly straightFlangeMm: number;
}

/** Signed distance from a point of the meridian half-plane to a head's profile, and the profile's outward unit normal at the nearest point. */
export interface MeridianDistance {
  /** Signed distance, mm: positive outside the head. */
  readonly distanceMm: number;
  /** Outward unit normal at the nearest profile point, component away from the axis. */
  readonly normalRho: number;
  /** Outward unit normal at the nearest profile point, component along the axis. */
  readonly normalZ: number;
}

/** What a head kind gives the shared operations: its profile in the meridian half-plane. */
export interface HeadProfile<S extends HeadSurfaceBase> {
  /**
   * Signed distance from (rho, z) (rho ≥ 0 from the axis, z along the axis
   * from the tangent line, mm) to the profile: the dish for z ≥ 0, the flange
   * line rho = radius below. Exact within the profile's smallest radius of
   * curvature of the surface, which is all the offsets allowed reach.
   */
  readonly distance: (surface: S, rhoMm: number, zMm: number) => MeridianDistance;
  /** Radius of the profile at the tangent line (the head's inside radius), mm. */
  readonly radiusMm: (surface: S) => number;
  /** Depth of the dish on the profile, tangent line to crown, mm. */
  readonly depthMm: (surface: S) => number;
  /** Smallest radius of curvature of the profile, mm: an inward offset must stay below it. */
  readonly minCurvatureRadiusMm: (surface: S) => number;
  /** Length along the profile from the crown to the nearest point of (rho, z) on it, mm (before the offset is added). */
  readonly meridianMm: (surface: S, rhoMm: number, zMm: number) => number;
}

/** A point in the head's own frame: distance from the axis, height above the tangent line, angle around from the reference meridian. */
export interface HeadLocalPoint {
  readonly rhoMm: number;
  readonly zMm: number;
  /** Radians in (−π, π], growing toward axisDirection × zeroDirection. */
  readonly angleRad: number;
}

/**
 * The reference meridian's direction of `s`, given or by the default rule.
 * @example headZeroDirection({ axisPoint: [0,0,0], axisDirection: [0,0,1], offsetMm: 0, straightFlangeMm: 0 }) // [1, 0, 0]
 */
export function headZeroDirection(s: HeadSurfaceBase): Vec3 {
  if (s.zeroDirection !== undefined) return s.zeroDirection;
  const a = s.axisDirection;
  const ref: Vec3 = Math.abs(a[0]) < 1 - 1e-12 ? [1, 0, 0] : [0, 1, 0];
  const k = dot(ref, a);
  const v: Vec3 = [ref[0] - k * a[0], ref[1] - k * a[1], ref[2] - k * a[2]];
  const n = Math.hypot(v[0], v[1], v[2]);
  return [v[0] / n, v[1] / n, v[2] / n];
}

/**
 * `point` in the head's own frame.
 * @example headLocal(head, [100, 0, 50]) // { rhoMm: 100, zMm: 50, angleRad: 0 } for a head about +z at the origin
 */
export function headLocal(s: HeadSurfaceBase, point: Vec3): HeadLocalPoint {
  const a = s.axisDirection;
  const w: Vec3 = [point[0] - s.axisPoint[0], point[1] - s.axisPoint[1], point[2] - s.axisPoint[2]];
  const z = dot(w, a);
  const r: Vec3 = [w[0] - z * a[0], w[1] - z * a[1], w[2] - z * a[2]];
  const zero = headZeroDirection(s);
  const side = cross(a, zero);
  return { rhoMm: Math.hypot(r[0], r[1], r[2]), zMm: z, angleRad: Math.atan2(dot(r, side), dot(r, zero)) };
}

/** Golden ratio step of the dip search. */
const INV_PHI = (Math.sqrt(5) - 1) / 2;
/** Most golden-section steps of the dip search (the bracket shrinks by 0.618 each: 1e-17 of it after 80). */
const MAX_DIP_STEPS = 90;
/** Most steps of the root refinement (regula falsi with bisection; a few dozen at most in practice). */
const MAX_ROOT_STEPS = 200;
/** Margin added to the bounding cylinder and crown height, relative to the head radius, so the bracket ends lie outside. */
const BOX_MARGIN_REL = 1e-3;

/**
 * The operations of a head kind from its profile: line intersection by a
 * safeguarded search on the signed distance along the line (the head with its
 * flange and shell is convex, so the distance along a line is convex and the
 * line meets the surface at most twice: it dips below zero on one interval),
 * the offset (the same profile, `offsetMm` moved; refused once an inward
 * offset reaches the profile's smallest radius of curvature), and the normal
 * (the profile's normal at the nearest point, turned about the axis). Heads
 * do not develop.
 *
 * Tangency: a line whose deepest point inside the surface is within
 * eps × radius / 2 of it (the cylinder's rule, where eps is relative to R²)
 * is one tangent root.
 * @example const ops = headOps(myProfile); ops.intersectLine(head, line, TANGENCY_REL_EPS)
 */
export function headOps<S extends HeadSurfaceBase & { readonly kind: string }>(profile: HeadProfile<S>): SurfaceOps<S> {
  const intersectLine = (s: S, line: Line3, eps: number): readonly LineRoot[] => {
    const a = s.axisDirection;
    const o = line.origin;
    const p = s.axisPoint;
    const d = line.direction;
    const w0: Vec3 = [o[0] - p[0], o[1] - p[1], o[2] - p[2]];
    const z0 = dot(w0, a);
    const dz = dot(d, a);
    const r0: Vec3 = [w0[0] - z0 * a[0], w0[1] - z0 * a[1], w0[2] - z0 * a[2]];
    const r1: Vec3 = [d[0] - dz * a[0], d[1] - dz * a[1], d[2] - dz * a[2]];
    const radius = profile.radiusMm(s);
    const off = s.offsetMm;
    const outerRho = radius + Math.max(off, 0);
    const margin = BOX_MARGIN_REL * radius + Math.abs(off);
    const rhoBox = outerRho + margin;
    const zTop = profile.depthMm(s) + Math.max(off, 0) + margin;
    const f = (t: number): number => {
      const x = r0[0] + t * r1[0];
      const y = r0[1] + t * r1[1];
      const zz = r0[2] + t * r1[2];
      return profile.distance(s, Math.sqrt(x * x + y * y + zz * zz), z0 + t * dz).distanceMm - off;
    };

    // The part of the line inside the box rho ≤ rhoBox, z ≤ zTop.
    let lo = -Infinity;
    let hi = Infinity;
    const qa = dot(r1, r1);
    const qb = dot(r0, r1);
    const qc = dot(r0, r0) - rhoBox * rhoBox;
    if (qa > 0) {
      const disc = qb * qb - qa * qc;
      if (!(disc > 0)) return [];
      const root = Math.sqrt(disc);
      lo = (-qb - root) / qa;
      hi = (-qb + root) / qa;
    } else if (qc > 0) {
      return [];
    }
    if (dz > 0) hi = Math.min(hi, (zTop - z0) / dz);
    else if (dz < 0) lo = Math.max(lo, (zTop - z0) / dz);
    else if (z0 > zTop) return [];
    // A line along the axis inside the shell: stop a radius below the tangent line (nothing to meet further down).
    const zFloor = -2 * rhoBox - s.straightFlangeMm;
    if (!Number.isFinite(lo)) lo = (zFloor - z0) / dz;
    if (!Number.isFinite(hi)) hi = (zFloor - z0) / dz;
    if (!(lo < hi)) return [];

    const tangentTol = (eps * radius) / 2;
    const fLo = f(lo);
    const fHi = f(hi);
    // Find a point inside (f < −tol) by golden-section search on the convex f; or its minimum.
    let inside: { t: number; ft: number } | undefined;
    if (fLo < -tangentTol) inside = { t: lo, ft: fLo };
    else if (fHi < -tangentTol) inside = { t: hi, ft: fHi };
    let best = fLo <= fHi ? { t: lo, ft: fLo } : { t: hi, ft: fHi };
    if (inside === undefined) {
      let aa = lo;
      let bb = hi;
      let c = bb - INV_PHI * (bb - aa);
      let e = aa + INV_PHI * (bb - aa);
      let fc = f(c);
      let fe = f(e);
      for (let i = 0; i < MAX_DIP_STEPS; i++) {
        if (fc < -tangentTol) {
          inside = { t: c, ft: fc };
          break;
        }
        if (fe < -tangentTol) {
          inside = { t: e, ft: fe };
          break;
        }
        if (fc <= fe) {
          bb = e;
          e = c;
          fe = fc;
          c = bb - INV_PHI * (bb - aa);
          if (c === e) break;
          fc = f(c);
        } else {
          aa = c;
          c = e;
          fc = fe;
          e = aa + INV_PHI * (bb - aa);
          if (c === e) break;
          fe = f(e);
        }
      }
      const m = fc <= fe ? { t: c, ft: fc } : { t: e, ft: fe };
      if (m.ft < best.ft) best = m;
    }
    if (inside === undefined) {
      return best.ft <= tangentTol ? [{ tMm: best.t, tangent: true }] : [];
    }
    const roots: LineRoot[] = [];
    if (fLo > 0) roots.push({ tMm: refineRoot(f, lo, fLo, inside.t, inside.ft), tangent: false });
    if (fHi > 0) roots.push({ tMm: refineRoot(f, inside.t, inside.ft, hi, fHi), tangent: false });
    return roots;
  };

  const offset = (s: S, distanceMm: number): S => {
    const offsetMm = s.offsetMm + distanceMm;
    const limit = profile.minCurvatureRadiusMm(s);
    if (!(offsetMm > -limit) || !Number.isFinite(offsetMm)) {
      throw new GirthError(
        'OUT_OF_RANGE',
        'gap',
        `gap: an offset of ${distanceMm} mm takes the head surface ${-offsetMm} mm inside its profile, past its smallest radius of curvature ${limit} mm`,
        distanceMm,
      );
    }
    return { ...s, offsetMm };
  };

  const normal = (s: S, point: Vec3): Vec3 => {
    const a = s.axisDirection;
    const w: Vec3 = [point[0] - s.axisPoint[0], point[1] - s.axisPoint[1], point[2] - s.axisPoint[2]];
    const z = dot(w, a);
    const r: Vec3 = [w[0] - z * a[0], w[1] - z * a[1], w[2] - z * a[2]];
    const rho = Math.hypot(r[0], r[1], r[2]);
    const m = profile.distance(s, rho, z);
    if (!(rho > 0)) return a;
    const k = m.normalRho / rho;
    return addScaled([r[0] * k, r[1] * k, r[2] * k], a, m.normalZ);
  };

  return { intersectLine, offset, normal };
}

/**
 * The root of f between `a` (f(a) = fa) and `b` (f(b) = fb), of opposite
 * signs: regula falsi with the Illinois step, bisecting when it stalls, to
 * the last bits of t.
 */
function refineRoot(f: (t: number) => number, a: number, fa: number, b: number, fb: number): number {
  // wa, wb: the weights regula falsi uses (halved on a stalled side); fa, fb: the true values.
  let wa = fa;
  let wb = fb;
  let side = 0;
  for (let i = 0; i < MAX_ROOT_STEPS; i++) {
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
    if (Math.abs(b - a) <= 4 * Number.EPSILON * Math.max(Math.abs(a), Math.abs(b))) break;
  }
  return Math.abs(fa) <= Math.abs(fb) ? a : b;
}
