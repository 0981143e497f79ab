import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { branchBundle } from '../branch/branch-frame.js';
import { hitGenerator } from '../generators.js';
import { cylinderOps, type CylinderSurface } from './cylinder.js';
import { findGrazingPhis } from './grazing.js';
import { SURFACES, type HostSurface } from './table.js';
import type { SurfaceTable } from './types.js';
import type { Vec3 } from '../vec3.js';

const header = (R: number): CylinderSurface => ({ kind: 'cylinder', radius: R, axisPoint: [0, 0, 0], axisDirection: [1, 0, 0] });

/** The table with the cylinder's closed-form grazes taken out, so findGrazingPhis must search. */
const SEARCH_ONLY: SurfaceTable<HostSurface> = { ...SURFACES, cylinder: { ...cylinderOps, grazingPhisRad: undefined } };

/** Rotation by `a` about the unit axis `k` (Rodrigues' formula, written out here for the test). */
function rotate(v: Vec3, k: Vec3, a: number): Vec3 {
  const c = Math.cos(a);
  const s = Math.sin(a);
  const kv = k[0] * v[0] + k[1] * v[1] + k[2] * v[2];
  const x: Vec3 = [k[1] * v[2] - k[2] * v[1], k[2] * v[0] - k[0] * v[2], k[0] * v[1] - k[1] * v[0]];
  return [v[0] * c + x[0] * s + k[0] * kv * (1 - c), v[1] * c + x[1] * s + k[1] * kv * (1 - c), v[2] * c + x[2] * s + k[2] * kv * (1 - c)];
}

describe('cylinder host', () => {
  it('a line square to the axis at height y meets the circle at z = ±sqrt(R² − y²) (Pythagoras), and touches it once at |y| = R', () => {
    const roots = cylinderOps.intersectLine(header(10), { origin: [3, 6, 50], direction: [0, 0, -1] }, 1e-12);
    expect(roots.map((r) => r.tMm)).toEqual([42, 58]);
    expect(roots.every((r) => !r.tangent)).toBe(true);
    expect(cylinderOps.intersectLine(header(10), { origin: [3, 10, 50], direction: [0, 0, -1] }, 1e-12)).toEqual([{ tMm: 50, tangent: true }]);
    expect(cylinderOps.intersectLine(header(10), { origin: [3, 10.001, 50], direction: [0, 0, -1] }, 1e-12)).toEqual([]);
  });

  it('develop and undevelop are inverse, and a full turn of girth is 2πR (invariant: stretch-out = π × OD)', () => {
    fc.assert(
      fc.property(fc.double({ min: -3.1, max: 3.1, noNaN: true }), fc.double({ min: -500, max: 500, noNaN: true }), (u, v) => {
        const c = header(150);
        const p = cylinderOps.undevelop!(c, [150 * u, v]);
        expect(Math.abs(Math.hypot(p[1], p[2]) - 150)).toBeLessThan(1e-9);
        const back = cylinderOps.develop!(c, p);
        expect(Math.abs(back[0] - 150 * u)).toBeLessThan(1e-9);
        expect(Math.abs(back[1] - v)).toBeLessThan(1e-9);
      }),
    );
    // Girth from the top line (+z) grows toward +y (DESIGN.md header-hole convention).
    expect(cylinderOps.develop!(header(150), [7, 150, 0])).toEqual([150 * (Math.PI / 2), 7]);
    expect(Math.abs(cylinderOps.develop!(header(150), [0, -1e-6, -150])[0] + 150 * Math.PI)).toBeLessThan(1e-5);
  });

  it('the closed-form grazes agree with the numeric search from the operations, for flush branches at any angle and offset, in any orientation (invariant)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 90, noNaN: true }),
        fc.double({ min: 0.2, max: 1, noNaN: true }),
        fc.boolean(),
        fc.double({ min: 0, max: 3, noNaN: true }),
        (angleDeg, k, negative, turn) => {
          const R = 150;
          const r = k * R;
          const e = (negative ? -1 : 1) * (R - r);
          const b = branchBundle((angleDeg * Math.PI) / 180, e, r);
          // The same joint turned about an arbitrary axis: no cylinder along x assumed.
          const axis: Vec3 = [0.48, 0.6, 0.64];
          const turned = {
            ...b,
            axisPoint: rotate(b.axisPoint, axis, turn),
            axisDirection: rotate(b.axisDirection, axis, turn),
            heelDirection: rotate(b.heelDirection, axis, turn),
            sideDirection: rotate(b.sideDirection, axis, turn),
          };
          const host: CylinderSurface = { ...header(R), axisDirection: rotate([1, 0, 0], axis, turn) };
          const closed = findGrazingPhis(turned, host);
          const searched = findGrazingPhis(turned, host, { surfaces: SEARCH_ONLY });
          // e + r sin phi = ±R: one graze (phi = ±90°) when 0 < |e|, two when e = 0. Where rounding leaves
          // the flush side a hair inside, the closed form lists the graze as two angles ~1e-8 apart.
          // The search locates a graze to ~1e-6 rad (a graze is ill-conditioned); allow 2e-6.
          expect(closed.length).toBeGreaterThan(0);
          expect(searched.length).toBeGreaterThan(0);
          const near = (p: number, q: number): boolean => Math.min(Math.abs(p - q), 2 * Math.PI - Math.abs(p - q)) < 2e-6;
          for (const p of closed) expect(searched.some((q) => near(p, q))).toBe(true);
          for (const q of searched) expect(closed.some((p) => near(p, q))).toBe(true);
          for (const phi of closed) expect(hitGenerator(turned, host, phi)?.grazing).toBe(true);
        },
      ),
      { numRuns: 40 },
    );
  });

  it('an equal tee grazes at phi = 90° and 270° (common practice: the kinks at the sides of an equal tee), and a smaller branch not at all', () => {
    const tee = branchBundle(Math.PI / 2, 0, 100);
    expect(findGrazingPhis(tee, header(100))).toEqual([Math.PI / 2, (3 * Math.PI) / 2]);
    expect(findGrazingPhis(branchBundle(Math.PI / 2, 0, 99), header(100))).toEqual([]);
    expect(findGrazingPhis(branchBundle(Math.PI / 2, 0, 99), header(100), { surfaces: SEARCH_ONLY })).toEqual([]);
  });

  it('offset moves the radius and refuses to leave none', () => {
    expect(cylinderOps.offset(header(100), -3).radius).toBe(97);
    expect(() => cylinderOps.offset(header(100), -100)).toThrow(/gap/);
  });
});
