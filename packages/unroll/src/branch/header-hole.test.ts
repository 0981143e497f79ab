import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { solveBranch, type BranchGeometry, type CylinderSurface, type GeneratorBundle, type Vec3 } from '@girth/geometry';
import { developHeaderHole } from './header-hole.js';

const IN = 25.4;

/** Rotation by `a` about the unit axis `k` (Rodrigues' formula, written out for the test). */
function rotate(v: Vec3, k: Vec3, a: number): Vec3 {
  const c = Math.cos(a);
  const s = Math.sin(a);
  const kv = k[0] * v[0] + k[1] * v[1] + k[2] * v[2];
  const x: Vec3 = [k[1] * v[2] - k[2] * v[1], k[2] * v[0] - k[0] * v[2], k[0] * v[1] - k[1] * v[0]];
  return [v[0] * c + x[0] * s + k[0] * kv * (1 - c), v[1] * c + x[1] * s + k[1] * kv * (1 - c), v[2] * c + x[2] * s + k[2] * kv * (1 - c)];
}

/** The hole's bundle and host moved rigidly: turned by `a` about `k`, then shifted by `shift`. */
function moved(g: BranchGeometry, k: Vec3, a: number, shift: Vec3): BranchGeometry {
  const point = (p: Vec3): Vec3 => {
    const q = rotate(p, k, a);
    return [q[0] + shift[0], q[1] + shift[1], q[2] + shift[2]];
  };
  const host = g.holeHost as CylinderSurface;
  const holeHost: CylinderSurface = {
    ...host,
    axisPoint: point(host.axisPoint),
    axisDirection: rotate(host.axisDirection, k, a),
    zeroGirthDirection: rotate(host.zeroGirthDirection ?? [0, 0, 1], k, a),
  };
  const b = g.holeBundle;
  const holeBundle: GeneratorBundle = {
    ...b,
    axisPoint: point(b.axisPoint),
    axisDirection: rotate(b.axisDirection, k, a),
    heelDirection: rotate(b.heelDirection, k, a),
    sideDirection: rotate(b.sideDirection, k, a),
  };
  return { ...g, holeHost, holeBundle };
}

describe('developHeaderHole', () => {
  it('develops the hole on the host surface itself: the same joint turned and moved anywhere gives the same template (invariant: the development is intrinsic)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(90, 60, 45),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true })).filter((v) => Math.hypot(...v) > 0.1),
        fc.double({ min: 0, max: 6, noNaN: true }),
        (angleDeg, offsetShare, axis, a) => {
          const g = solveBranch({
            header: { odMm: 12.75 * IN, wallMm: 0.375 * IN },
            branch: { odMm: 6.625 * IN, wallMm: 0.28 * IN },
            angleDeg,
            offsetMm: offsetShare * 60,
          });
          const n = Math.hypot(...axis);
          const k: Vec3 = [axis[0] / n, axis[1] / n, axis[2] / n];
          const input = { stations: 16, title: 'Header hole', notes: [] };
          const here = developHeaderHole({ ...input, geometry: g });
          const there = developHeaderHole({ ...input, geometry: moved(g, k, a, [250, -40, 1000]) });
          // 1e-9 x OD: rounding of the turned coordinates.
          const tol = 1e-9 * 12.75 * IN;
          here.stations.forEach((s, i) => {
            const t = there.stations[i]!;
            expect(Math.abs(s.values.girth! - t.values.girth!)).toBeLessThan(tol);
            expect(Math.abs(s.values.axial! - t.values.axial!)).toBeLessThan(tol);
          });
          // The centre mark (where the branch axis pierces the header) is found the same way.
          const mark = (t: typeof here): readonly [number, number] => {
            const m = t.marks[2]!;
            return m.kind === 'segment' ? [(m.from[0] + m.to[0]) / 2, m.from[1]] : [NaN, NaN];
          };
          expect(Math.abs(mark(here)[0] - mark(there)[0])).toBeLessThan(tol);
          expect(Math.abs(mark(here)[1] - mark(there)[1])).toBeLessThan(tol);
        },
      ),
      { numRuns: 30 },
    );
  });
});
