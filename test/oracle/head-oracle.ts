/**
 * Test oracle for nozzles in dished heads, written from the stated
 * conventions alone and not from the library's code:
 *
 * - Head frame: vessel axis +z out through the crown, tangent line's centre
 *   at the origin. The inside profile in the meridian half-plane (rho, z) is a
 *   parametric curve from the crown (u = 0) to the tangent line (u = π/2):
 *   ellipse (a sin u, b cos u) with a = ID/2, b = ID / (2 ratio); hemisphere
 *   b = a; torispherical: crown arc about (0, zc) of radius L, then knuckle
 *   arc about (a − r, 0) of radius r, by the normal's angle u. Below the
 *   tangent line the flange rho = a.
 * - The signed distance to that profile is found by sampling the curve and
 *   bisecting the foot condition (p − c(u)) · c'(u) = 0; a head surface at
 *   offset d is where the signed distance is d (outside d = wall).
 * - The nozzle: axis point P0 on the outside at x = offset (y = 0); axis
 *   (0, 0, 1) hillside, the outside's normal at P0 radial, (sin t, 0, cos t)
 *   tilted. Heel = the part of +x square to the axis; side = (−axis) × heel.
 *   Generator at phi: P0 + r (cos phi heel + sin phi side) + s axis, cut where
 *   it first meets the host coming from large s (bracketing and bisection on
 *   the signed distance, which is convex along a line).
 * - Cutback = s − min s over the cut; drop = max s − s over the hole;
 *   meridian = length of the outside's profile from the crown to the foot
 *   (polyline lengths with Richardson extrapolation); around = −rho atan2(y, x).
 */
import { bisectSignChange, findDipOfConvex, minimiseUnimodal } from './root-finding.js';
import type { Vec3 } from './vec3.js';

/** A head as the oracle needs it, in the library's input shape. */
export interface OracleHead {
  readonly type: 'ellipsoidal' | 'hemispherical' | 'flanged-and-dished' | '80-10' | 'torispherical';
  readonly odMm: number;
  readonly wallMm: number;
  readonly ratio?: number;
  readonly crownRadiusMm?: number;
  readonly knuckleRadiusMm?: number;
}

/** A nozzle joint in the library's input shape. */
export interface OracleNozzleSpec {
  readonly head: OracleHead;
  readonly nozzle: { readonly odMm: number; readonly wallMm: number };
  readonly offsetMm?: number;
  readonly direction?: 'hillside' | 'radial' | 'angle';
  readonly tiltDeg?: number;
  readonly fit?: 'set-on' | 'set-in';
  readonly gapMm?: number;
}

interface Profile {
  readonly a: number;
  readonly point: (u: number) => readonly [number, number];
  readonly tangent: (u: number) => readonly [number, number];
  /** Parameters where the curve's pieces join (curvature jumps), inside (0, π/2). */
  readonly breaks: readonly number[];
}

const HALF_PI = Math.PI / 2;
const SAMPLES = 64;

function profileOf(h: OracleHead): Profile {
  const a = (h.odMm - 2 * h.wallMm) / 2;
  if (h.type === 'ellipsoidal' || h.type === 'hemispherical') {
    const b = h.type === 'hemispherical' ? a : a / (h.ratio ?? 2);
    return { a, point: (u) => [a * Math.sin(u), b * Math.cos(u)], tangent: (u) => [a * Math.cos(u), -b * Math.sin(u)], breaks: [] };
  }
  const [L, r] =
    h.type === 'flanged-and-dished' ? [h.odMm, 0.06 * h.odMm] : h.type === '80-10' ? [0.8 * h.odMm, 0.1 * h.odMm] : [h.crownRadiusMm as number, h.knuckleRadiusMm as number];
  const zc = -Math.sqrt((L - r) ** 2 - (a - r) ** 2);
  const uj = Math.atan2(a - r, -zc);
  return {
    a,
    point: (u) => (u <= uj ? [L * Math.sin(u), zc + L * Math.cos(u)] : [a - r + r * Math.sin(u), r * Math.cos(u)]),
    tangent: (u) => (u <= uj ? [L * Math.cos(u), -L * Math.sin(u)] : [r * Math.cos(u), -r * Math.sin(u)]),
    breaks: [uj],
  };
}

/** The foot of (rho, z) on the dish: parameter and distance. */
function footOnDish(p: Profile, rho: number, z: number): { u: number; d: number } {
  const dist = (u: number): number => {
    const c = p.point(u);
    return Math.hypot(rho - c[0], z - c[1]);
  };
  let best = 0;
  let bestD = Infinity;
  for (let i = 0; i <= SAMPLES; i++) {
    const d = dist((HALF_PI * i) / SAMPLES);
    if (d < bestD) [best, bestD] = [i, d];
  }
  const lo = (HALF_PI * Math.max(0, best - 1)) / SAMPLES;
  const hi = (HALF_PI * Math.min(SAMPLES, best + 1)) / SAMPLES;
  // g(u) = (p − c(u)) · c'(u): positive before the foot, negative after.
  const g = (u: number): number => {
    const c = p.point(u);
    const t = p.tangent(u);
    return (rho - c[0]) * t[0] + (z - c[1]) * t[1];
  };
  let u = (HALF_PI * best) / SAMPLES;
  if (g(lo) > 0 && g(hi) < 0) u = bisectSignChange((x) => -g(x), lo, hi);
  else if (lo < hi) u = minimiseUnimodal(dist, lo, hi, { absTol: 1e-15 }).x;
  return { u, d: dist(u) };
}

/** Signed distance from a 3D point to the head's inside profile (with its flange), mm: positive outside. */
function signedDistance(p: Profile, q: Vec3): number {
  const rho = Math.hypot(q[0], q[1]);
  const z = q[2];
  const flange = z <= 0 ? Math.abs(rho - p.a) : Math.hypot(rho - p.a, z);
  const dish = footOnDish(p, rho, z).d;
  const d = Math.min(flange, dish);
  let inside: boolean;
  if (z <= 0) inside = rho < p.a;
  else if (z >= p.point(0)[1]) inside = false;
  else {
    const u = bisectSignChange((x) => z - p.point(x)[1], 0, HALF_PI); // profile height falls from crown to tangent line
    inside = rho < p.point(u)[0];
  }
  return inside ? -d : d;
}

/** Outward unit normal (3D) of the head at offset d through the point q on it. */
function normalAt(p: Profile, q: Vec3): Vec3 {
  const rho = Math.hypot(q[0], q[1]);
  const { u } = footOnDish(p, rho, q[2]);
  const t = p.tangent(u);
  const len = Math.hypot(t[0], t[1]);
  const [nr, nz] = [-t[1] / len, t[0] / len];
  return rho > 0 ? [(nr * q[0]) / rho, (nr * q[1]) / rho, nz] : [0, 0, 1];
}

/** Length along the profile moved out by `d`, from the crown to parameter `u`, mm. */
function offsetArcLength(p: Profile, d: number, u: number): number {
  const q = (x: number): readonly [number, number] => {
    const c = p.point(x);
    const t = p.tangent(x);
    const len = Math.hypot(t[0], t[1]);
    return [c[0] - (d * t[1]) / len, c[1] + (d * t[0]) / len];
  };
  const poly = (from: number, to: number, n: number): number => {
    let sum = 0;
    let prev = q(from);
    for (let i = 1; i <= n; i++) {
      const next = q(from + ((to - from) * i) / n);
      sum += Math.hypot(next[0] - prev[0], next[1] - prev[1]);
      prev = next;
    }
    return sum;
  };
  const cuts = [0, ...p.breaks.filter((b) => b < u), u];
  let total = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    const [from, to] = [cuts[i] as number, cuts[i + 1] as number];
    if (!(to > from)) continue;
    const coarse = poly(from, to, 2048);
    const fine = poly(from, to, 4096);
    total += fine + (fine - coarse) / 3; // Richardson: polyline error falls as 1/n²
  }
  return total;
}

/** One station of the oracle's nozzle, exact. */
export interface ExactNozzleStation {
  readonly phiRad: number;
  /** Cutback of the nozzle cut, mm. */
  readonly cutback: number;
  /** Drop of the hole from the plane square to the nozzle axis through its highest point, mm. */
  readonly drop: number;
  /** Tape over the head's outside from the crown centre down the meridian, mm. */
  readonly meridian: number;
  /** Tape around the parallel from the reference meridian, positive toward station 5's side, mm. */
  readonly around: number;
  /** The hole point in 3D, mm. */
  readonly holePoint: Vec3;
}

/**
 * The stations of a nozzle in a head (station n at phi = 2π (n − 1) / N),
 * from the conventions in this file's header.
 * @example exactNozzleStations({ head: { type: 'ellipsoidal', odMm: 1219.2, wallMm: 12.7 }, nozzle: { odMm: 168.3, wallMm: 7.1 }, offsetMm: 300 }, 16)
 */
export function exactNozzleStations(spec: OracleNozzleSpec, stations: number): readonly ExactNozzleStation[] {
  const p = profileOf(spec.head);
  const wall = spec.head.wallMm;
  const offset = spec.offsetMm ?? 0;
  const gap = spec.gapMm ?? 0;
  const setIn = spec.fit === 'set-in';
  const radius = (setIn ? spec.nozzle.odMm : spec.nozzle.odMm - 2 * spec.nozzle.wallMm) / 2;
  const far = 4 * spec.head.odMm;

  // P0: the outside on the vertical line x = offset.
  const onVertical = (z: number): number => signedDistance(p, [offset, 0, z]) - wall;
  const z0 = bisectSignChange(onVertical, -1, p.point(0)[1] + wall + 1);
  const p0: Vec3 = [offset, 0, z0];
  let axis: Vec3;
  if ((spec.direction ?? 'hillside') === 'hillside') axis = [0, 0, 1];
  else if (spec.direction === 'radial') axis = normalAt(p, p0);
  else {
    const t = ((spec.tiltDeg ?? 0) * Math.PI) / 180;
    axis = [Math.sin(t), 0, Math.cos(t)];
  }
  const hx: Vec3 = [1 - axis[0] * axis[0], -axis[0] * axis[1], -axis[0] * axis[2]];
  const hl = Math.hypot(...hx);
  const heel: Vec3 = [hx[0] / hl, hx[1] / hl, hx[2] / hl];
  const m: Vec3 = [-axis[0], -axis[1], -axis[2]];
  const side: Vec3 = [m[1] * heel[2] - m[2] * heel[1], m[2] * heel[0] - m[0] * heel[2], m[0] * heel[1] - m[1] * heel[0]];

  const at = (phi: number, s: number): Vec3 => {
    const c = radius * Math.cos(phi);
    const n = radius * Math.sin(phi);
    return [p0[0] + c * heel[0] + n * side[0] + s * axis[0], p0[1] + c * heel[1] + n * side[1] + s * axis[1], p0[2] + c * heel[2] + n * side[2] + s * axis[2]];
  };
  const cutS = (phi: number, hostOffset: number): number => {
    const g = (s: number): number => signedDistance(p, at(phi, s)) - hostOffset;
    const dip = findDipOfConvex(g, -far, far, { relTol: 1e-6 });
    if (dip.kind !== 'found') throw new Error(`oracle: generator at ${phi} misses the head`);
    return bisectSignChange(g, dip.x, far);
  };
  const cutOffset = (setIn ? 0 : wall) + gap;
  const extreme = (f: (phi: number) => number, sign: 1 | -1): number => {
    const grid = 72;
    let best = 0;
    let bestV = Infinity;
    for (let i = 0; i < grid; i++) {
      const v = sign * f((2 * Math.PI * i) / grid);
      if (v < bestV) [best, bestV] = [i, v];
    }
    const step = (2 * Math.PI) / grid;
    return sign * minimiseUnimodal((x) => sign * f(x), (best - 1) * step, (best + 1) * step, { absTol: 1e-12 }).fx;
  };
  const sMin = extreme((phi) => cutS(phi, cutOffset), 1);
  const sTop = extreme((phi) => cutS(phi, wall), -1);

  return Array.from({ length: stations }, (_, i) => {
    const phi = (2 * Math.PI * i) / stations;
    const sCut = cutS(phi, cutOffset);
    const sHole = cutS(phi, wall);
    const h = at(phi, sHole);
    const rho = Math.hypot(h[0], h[1]);
    const { u } = footOnDish(p, rho, h[2]);
    return {
      phiRad: phi,
      cutback: sCut - sMin,
      drop: sTop - sHole,
      meridian: offsetArcLength(p, wall, u),
      around: -rho * Math.atan2(h[1], h[0]),
      holePoint: h,
    };
  });
}
