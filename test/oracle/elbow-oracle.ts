/**
 * Test oracle for trunnions on elbows, written from the stated conventions
 * alone and not from the library's code:
 *
 * - Elbow frame: bend centre at the origin, bend axis +z, the inlet end's
 *   cross-section at +x (bend angle 0), the bend turning toward +y. The elbow
 *   body is the implicit surface F(p) = √((√(x² + y²) − R)² + z²) − r = 0,
 *   r = OD/2 outside, ID/2 inside, moved out by a root gap.
 * - The trunnion's axis point P0 is on the outside at bend angle b and angle a
 *   around from the extrados (toward +z); its axis is the outside's normal
 *   there (the gradient of F, by central differences), or the inlet end's axis
 *   (0, 1, 0) or the outlet end's (−sin β, cos β, 0), whichever sense leaves
 *   the elbow. Heel = the part of (sin b, −cos b, 0) square to the axis;
 *   side = (−axis) × heel.
 * - Generator at phi: P0 + rc (cos phi heel + sin phi side) + s axis, cut
 *   where it first meets the host coming from large s: marched inward in steps
 *   of OD/2000 until F ≤ 0, then bisected (no closed form, no quartic).
 * - Tape: around = r atan2(z, ρ − R); along = ρ atan2(y, x), ρ = √(x² + y²).
 */
import { bisectSignChange } from './root-finding.js';
import type { Vec3 } from './vec3.js';

/** A trunnion joint in the library's input shape. */
export interface OracleTrunnionSpec {
  readonly elbow: { readonly pipe: { readonly odMm: number; readonly wallMm: number }; readonly radius: number; readonly bendDeg: number };
  readonly branch: { readonly odMm: number; readonly wallMm: number };
  readonly alongDeg: number;
  readonly aroundDeg: number;
  readonly direction: 'normal' | 'inlet' | 'outlet';
  readonly fit: 'set-on' | 'set-in';
  readonly gapMm: number;
}

/** One station as the oracle finds it: s along the trunnion axis on the cut and on the hole, and the hole's tape position. */
export interface OracleTrunnionStation {
  readonly cutS: number;
  readonly holeS: number;
  readonly around: number;
  readonly along: number;
}

const DEG = Math.PI / 180;

function torusF(R: number, r: number): (p: Vec3) => number {
  return (p) => Math.hypot(Math.hypot(p[0], p[1]) - R, p[2]) - r;
}

function gradient(f: (p: Vec3) => number, p: Vec3, h: number): Vec3 {
  const g = [0, 1, 2].map((i) => {
    const a: [number, number, number] = [p[0], p[1], p[2]];
    const b: [number, number, number] = [p[0], p[1], p[2]];
    a[i] = p[i]! + h;
    b[i] = p[i]! - h;
    return (f(a) - f(b)) / (2 * h);
  });
  const n = Math.hypot(g[0]!, g[1]!, g[2]!);
  return [g[0]! / n, g[1]! / n, g[2]! / n];
}

/** First s (coming down from far out along the axis) where the line p(s) meets F = 0. */
function firstMeeting(f: (p: Vec3) => number, at: (s: number) => Vec3, sStart: number, step: number): number {
  let s = sStart;
  if (!(f(at(s)) > 0)) throw new Error('oracle: start point is not outside');
  for (let i = 0; i < 1e6; i++) {
    const next = s - step;
    if (f(at(next)) <= 0) return bisectSignChange((x) => f(at(x)), next, s);
    s = next;
  }
  throw new Error('oracle: the generator misses the elbow');
}

/**
 * Every station (phi = 360° i / n from the heel) of a trunnion on an elbow.
 * @example exactTrunnionStations(spec, 16)[0].along
 */
export function exactTrunnionStations(spec: OracleTrunnionSpec, stations: number): readonly OracleTrunnionStation[] {
  const R = spec.elbow.radius;
  const od = spec.elbow.pipe.odMm;
  const ro = od / 2;
  const ri = ro - spec.elbow.pipe.wallMm;
  const outside = torusF(R, ro);
  const b = spec.alongDeg * DEG;
  const a = spec.aroundDeg * DEG;
  const rho0 = R + ro * Math.cos(a);
  const p0: Vec3 = [rho0 * Math.cos(b), rho0 * Math.sin(b), ro * Math.sin(a)];
  const n = gradient(outside, p0, 1e-4 * ro);
  let axis: Vec3 = n;
  if (spec.direction !== 'normal') {
    const beta = spec.elbow.bendDeg * DEG;
    const leg: Vec3 = spec.direction === 'inlet' ? [0, 1, 0] : [-Math.sin(beta), Math.cos(beta), 0];
    const k = leg[0] * n[0] + leg[1] * n[1] + leg[2] * n[2];
    axis = k > 0 ? leg : [-leg[0], -leg[1], -leg[2]];
  }
  const back: Vec3 = [Math.sin(b), -Math.cos(b), 0];
  const kb = back[0] * axis[0] + back[1] * axis[1] + back[2] * axis[2];
  let heel: Vec3 = [back[0] - kb * axis[0], back[1] - kb * axis[1], back[2] - kb * axis[2]];
  if (Math.hypot(heel[0], heel[1], heel[2]) < 1e-6) heel = [-axis[2] * axis[0], -axis[2] * axis[1], 1 - axis[2] * axis[2]];
  const hl = Math.hypot(heel[0], heel[1], heel[2]);
  heel = [heel[0] / hl, heel[1] / hl, heel[2] / hl];
  const t: Vec3 = [-axis[0], -axis[1], -axis[2]];
  const side: Vec3 = [t[1] * heel[2] - t[2] * heel[1], t[2] * heel[0] - t[0] * heel[2], t[0] * heel[1] - t[1] * heel[0]];

  const branchOd = spec.branch.odMm;
  const cutR = (spec.fit === 'set-on' ? branchOd - 2 * spec.branch.wallMm : branchOd) / 2;
  const hostR = (spec.fit === 'set-on' ? ro : ri) + spec.gapMm;
  const host = torusF(R, hostR);
  const step = od / 2000;
  const sStart = 2 * od;
  const out: OracleTrunnionStation[] = [];
  for (let i = 0; i < stations; i++) {
    const phi = (2 * Math.PI * i) / stations;
    const off: Vec3 = [0, 1, 2].map((k) => p0[k]! + cutR * (Math.cos(phi) * heel[k]! + Math.sin(phi) * side[k]!)) as unknown as Vec3;
    const at = (s: number): Vec3 => [off[0] + s * axis[0], off[1] + s * axis[1], off[2] + s * axis[2]];
    const cutS = firstMeeting(host, at, sStart, step);
    const holeS = firstMeeting(outside, at, sStart, step);
    const q = at(holeS);
    const rho = Math.hypot(q[0], q[1]);
    out.push({ cutS, holeS, around: ro * Math.atan2(q[2], rho - R), along: rho * Math.atan2(q[1], q[0]) });
  }
  return out;
}
