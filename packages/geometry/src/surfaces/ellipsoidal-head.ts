/**
 * Host kind `ellipsoidal-head`: an ellipsoidal vessel head (half an
 * ellipsoid of revolution; 2:1 is the common one) with its straight flange,
 * and any surface parallel to it. The outside of a head whose inside is an
 * ellipsoid is not an ellipsoid; it is the inside moved out by the wall along
 * its normal, which is what this surface is.
 */
import { headOps, type HeadProfile, type HeadSurfaceBase } from './head-of-revolution.js';
import type { SurfaceOps } from './types.js';

/**
 * An ellipsoidal head: on its profile (the inside) half an ellipsoid of
 * revolution with equatorial radius `radiusMm` (half the ID, at the tangent
 * line) and depth `depthMm` (tangent line to crown), then the straight
 * flange and shell, a cylinder of the same radius. The surface is the profile
 * moved out by `offsetMm` along its normal. A 2:1 head has depth = radius / 2,
 * ID / 4 (ASME Section VIII Div. 1 UG-32(d): D / 2h = 2, inside dimensions;
 * recalled). Outside is away from the vessel. Lengths in mm.
 */
export interface EllipsoidalHeadSurface extends HeadSurfaceBase {
  readonly kind: 'ellipsoidal-head';
  /** Inside radius at the tangent line, mm, > 0. */
  readonly radiusMm: number;
  /** Inside depth, tangent line to crown, mm, > 0. */
  readonly depthMm: number;
}

/** Most Newton steps for the nearest point on the ellipse; it converges from one side in a handful. */
const MAX_NEWTON_STEPS = 100;

/**
 * The nearest point (x0, x1) on the quarter ellipse (x0/e0)² + (x1/e1)² = 1
 * to (y0, y1), all ≥ 0, with e0 ≥ e1 > 0. D. Eberly's reduction ("Distance
 * from a Point to an Ellipse, an Ellipsoid, or a Hyperellipsoid") to one
 * root of a convex decreasing function, solved here by Newton's method from
 * the side where it is positive (monotone, no overshoot).
 */
function footOnEllipse(e0: number, e1: number, y0: number, y1: number): readonly [number, number] {
  if (y1 > 0) {
    if (y0 > 0) {
      const z0 = y0 / e0;
      const z1 = y1 / e1;
      const g = z0 * z0 + z1 * z1 - 1;
      if (g === 0) return [y0, y1];
      const r0 = (e0 / e1) ** 2;
      const n0 = r0 * z0;
      const big = (s: number): number => (n0 / (s + r0)) ** 2 + (z1 / (s + 1)) ** 2 - 1;
      let s = g > 0 ? 0 : z1 - 1;
      for (let i = 0; i < MAX_NEWTON_STEPS; i++) {
        const a = n0 / (s + r0);
        const b = z1 / (s + 1);
        const value = a * a + b * b - 1;
        if (!(value > 0)) break;
        const slope = (-2 * a * a) / (s + r0) - (2 * b * b) / (s + 1);
        const next = s - value / slope;
        if (!(next > s)) break;
        if (!(big(next) >= 0)) {
          // Rounding put the step past the root: take it only if it is nearer.
          if (Math.abs(big(next)) < value) s = next;
          break;
        }
        s = next;
      }
      return [(r0 * y0) / (s + r0), y1 / (s + 1)];
    }
    return [0, e1];
  }
  const numer0 = e0 * y0;
  const denom0 = e0 * e0 - e1 * e1;
  if (numer0 < denom0) {
    const xde0 = numer0 / denom0;
    return [e0 * xde0, e1 * Math.sqrt(1 - xde0 * xde0)];
  }
  return [e0, 0];
}

/** Nearest point on the profile's quarter ellipse (rho semi-axis a, z semi-axis b) to (rho, z ≥ 0). */
function foot(a: number, b: number, rho: number, z: number): readonly [number, number] {
  if (a >= b) return footOnEllipse(a, b, rho, z);
  const [x1, x0] = footOnEllipse(b, a, z, rho);
  return [x0, x1];
}

/** Gauss-Legendre nodes and weights on [−1, 1], by Newton's method on the Legendre polynomial. */
function gaussLegendre(n: number): { readonly x: readonly number[]; readonly w: readonly number[] } {
  const x: number[] = [];
  const w: number[] = [];
  for (let i = 1; i <= n; i++) {
    let t = Math.cos((Math.PI * (i - 0.25)) / (n + 0.5));
    let dp = 0;
    for (let k = 0; k < 100; k++) {
      let p0 = 1;
      let p1 = t;
      for (let j = 2; j <= n; j++) {
        const p2 = ((2 * j - 1) * t * p1 - (j - 1) * p0) / j;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (t * p1 - p0)) / (t * t - 1);
      const next = t - p1 / dp;
      if (Math.abs(next - t) < 1e-16) {
        t = next;
        break;
      }
      t = next;
    }
    x.push(t);
    w.push(2 / ((1 - t * t) * dp * dp));
  }
  return { x, w };
}

const GL = gaussLegendre(16);
/** Panels of the 16-point rule over the arc; the integrand is smooth, so this is exact to rounding for ratios up to 4. */
const ARC_PANELS = 8;

/** Arc length of x = a sin u, z = b cos u from u = 0 (crown) to u, mm. */
function arcFromCrown(a: number, b: number, u: number): number {
  let sum = 0;
  const width = u / ARC_PANELS;
  for (let p = 0; p < ARC_PANELS; p++) {
    const mid = (p + 0.5) * width;
    for (let i = 0; i < GL.x.length; i++) {
      const v = mid + (width / 2) * (GL.x[i] as number);
      sum += (GL.w[i] as number) * Math.hypot(a * Math.cos(v), b * Math.sin(v));
    }
  }
  return (sum * width) / 2;
}

const profile: HeadProfile<EllipsoidalHeadSurface> = {
  distance(s, rho, z) {
    const a = s.radiusMm;
    const b = s.depthMm;
    if (z < 0) return { distanceMm: rho - a, normalRho: 1, normalZ: 0 };
    const [x0, x1] = foot(a, b, rho, z);
    const nr = x0 / (a * a);
    const nz = x1 / (b * b);
    const n = Math.hypot(nr, nz);
    const d = Math.hypot(rho - x0, z - x1);
    const inside = (rho / a) ** 2 + (z / b) ** 2 < 1;
    return { distanceMm: inside ? -d : d, normalRho: nr / n, normalZ: nz / n };
  },
  radiusMm: (s) => s.radiusMm,
  depthMm: (s) => s.depthMm,
  minCurvatureRadiusMm: (s) => (s.radiusMm >= s.depthMm ? s.depthMm ** 2 / s.radiusMm : s.radiusMm ** 2 / s.depthMm),
  meridianMm(s, rho, z) {
    // On the surface moved out by d, the length from the crown is the profile's arc plus d times the angle the normal has turned.
    const a = s.radiusMm;
    const b = s.depthMm;
    if (z < 0) return arcFromCrown(a, b, Math.PI / 2) + (s.offsetMm * Math.PI) / 2 - z;
    const [x0, x1] = foot(a, b, rho, z);
    const u = Math.atan2(x0 / a, x1 / b);
    const turn = Math.atan2(x0 / (a * a), x1 / (b * b));
    return arcFromCrown(a, b, u) + s.offsetMm * turn;
  },
};

/** The profile operations of an ellipsoidal head (signed distance, radii, meridian length), for the head functions. */
export const ellipsoidalHeadProfile = profile;

/**
 * The operations of host kind `ellipsoidal-head` (see `headOps`): line
 * intersection, offset, normal. An ellipsoid does not develop.
 * @example ellipsoidalHeadOps.offset(inside, 12.7).offsetMm // 12.7: the outside of a 1/2 in head
 */
export const ellipsoidalHeadOps: SurfaceOps<EllipsoidalHeadSurface> = headOps(profile);
