import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../support/expect-close.js';
import { cutGeneratorAgainstCylinder, cutGeneratorAgainstPlane, type OracleCylinder, type OracleLine } from './generator-cut.js';
import { add, combine, type Vec3 } from './vec3.js';

/** Rotation matrix (rows) of a unit quaternion built from four numbers. */
function rotationFrom(q: readonly [number, number, number, number]): readonly [Vec3, Vec3, Vec3] {
  const n = Math.hypot(...q);
  const [w, x, y, z] = q.map((c) => c / n) as [number, number, number, number];
  return [
    [1 - 2 * (y * y + z * z), 2 * (x * y - w * z), 2 * (x * z + w * y)],
    [2 * (x * y + w * z), 1 - 2 * (x * x + z * z), 2 * (y * z - w * x)],
    [2 * (x * z - w * y), 2 * (y * z + w * x), 1 - 2 * (x * x + y * y)],
  ];
}
function rotate(m: readonly [Vec3, Vec3, Vec3], p: Vec3): Vec3 {
  return [m[0][0] * p[0] + m[0][1] * p[1] + m[0][2] * p[2], m[1][0] * p[0] + m[1][1] * p[1] + m[1][2] * p[2], m[2][0] * p[0] + m[2][1] * p[1] + m[2][2] * p[2]];
}

/** Tee generator at phi for a branch of radius r along +z, heel toward -x (the branch convention at A = 90°). */
function teeGenerator(r: number, phi: number): OracleLine {
  return { kind: 'line', originMm: [-r * Math.cos(phi), r * Math.sin(phi), 0], direction: [0, 0, 1] };
}
const xCylinder = (R: number): OracleCylinder => ({ kind: 'cylinder', radiusMm: R, axisPointMm: [0, 0, 0], axisDirection: [1, 0, 0] });

function sOf(line: OracleLine, host: Parameters<typeof cutGeneratorAgainstCylinder>[1]): number {
  const cut = cutGeneratorAgainstCylinder(line, host);
  if (cut.kind !== 'hit') throw new Error(`expected a hit, got ${cut.reason}`);
  return cut.sMm;
}

describe('cutGeneratorAgainstCylinder against published statements', () => {
  it('reproduces the 90° saddle depth h = R - sqrt(R² - r² sin² phi) (MathWorld, "Cylinder-Cylinder Intersection"; REFERENCES.md)', () => {
    // Sizes: a header of 323.9 mm OD (EN 10220 DN 300, recalled) with branches up to 0.95 of its radius.
    const R = 323.9 / 2;
    for (const ratio of [0.1, 0.5, 0.8, 0.95]) {
      const r = ratio * R;
      const phis = Array.from({ length: 32 }, (_, i) => (2 * Math.PI * i) / 32);
      const depth = phis.map((phi) => R - sOf(teeGenerator(r, phi), xCylinder(R)));
      const expected = phis.map((phi) => R - Math.sqrt(R * R - r * r * Math.sin(phi) ** 2));
      // 1e-12 R: bisection closes to adjacent doubles; the formula itself is good to a few ulp of R here (r <= 0.95 R).
      expectClose(depth, expected, 1e-12 * R, `saddle depth r/R = ${ratio}`);
    }
  });

  it('gives a planar cut for equal radii at 90°: every point lies on z = x or z = -x (Wikipedia, "Steinmetz curve")', () => {
    const R = 100;
    // Stations offset from 90°/270° so no generator is tangent (there the cut point is ill-conditioned).
    const phis = Array.from({ length: 40 }, (_, i) => (2 * Math.PI * (i + 0.37)) / 40);
    for (const phi of phis) {
      const cut = cutGeneratorAgainstCylinder(teeGenerator(R, phi), xCylinder(R));
      if (cut.kind !== 'hit') throw new Error('expected a hit');
      const [x, , z] = cut.pointMm;
      // Conditioning near the flanks: error ~ eps R² / z, z >= R |cos phi| >= 0.058 R here; 1e-12 R is ample.
      expectClose(Math.abs(z), Math.abs(x), 1e-12 * R, `Steinmetz plane at phi = ${phi}`);
      // The heel half (cos phi > 0) lies on z = -x, the toe half on z = +x (first hit from +z).
      expect(Math.sign(x)).toBe(-Math.sign(Math.cos(phi)));
    }
  });

  it('takes the first meeting coming in from +direction, not the far one (first principles)', () => {
    expectClose(sOf({ kind: 'line', originMm: [0, 0, 0], direction: [0, 0, 1] }, xCylinder(10)), 10, 1e-14, 'up');
    const down = cutGeneratorAgainstCylinder({ kind: 'line', originMm: [0, 0, 0], direction: [0, 0, -1] }, xCylinder(10));
    expect(down.kind === 'hit' && down.pointMm[2]).toBe(-10);
  });

  it('takes a graze as a touch at the closest point, and a line 1e-9 R outside as a miss (first principles)', () => {
    const graze = cutGeneratorAgainstCylinder({ kind: 'line', originMm: [0, 10, 0], direction: [0, 0, 1] }, xCylinder(10));
    expect(graze.kind).toBe('hit');
    // The tangent point is s = 0; a flat minimum is located to ~sqrt(eps) R (1.5e-7 here).
    if (graze.kind === 'hit') expect(Math.abs(graze.sMm)).toBeLessThanOrEqual(1e-6);
    expect(cutGeneratorAgainstCylinder({ kind: 'line', originMm: [0, 10 + 1e-8, 0], direction: [0, 0, 1] }, xCylinder(10)).kind).toBe('miss');
  });

  it('reports a miss for a line outside the cylinder or parallel to its axis', () => {
    expect(cutGeneratorAgainstCylinder({ kind: 'line', originMm: [0, 10.001, 0], direction: [0, 0, 1] }, xCylinder(10))).toEqual({ kind: 'miss', reason: 'outside' });
    expect(cutGeneratorAgainstCylinder({ kind: 'line', originMm: [0, 1, 0], direction: [1, 0, 0] }, xCylinder(10))).toEqual({ kind: 'miss', reason: 'parallel' });
  });

  it('is unchanged by a rigid motion of the whole set-up (invariant; rotation from a random quaternion)', () => {
    const arb = fc.record({
      q: fc.tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: 0.1, max: 1, noNaN: true })),
      t: fc.tuple(fc.double({ min: -500, max: 500, noNaN: true }), fc.double({ min: -500, max: 500, noNaN: true }), fc.double({ min: -500, max: 500, noNaN: true })),
      R: fc.double({ min: 10, max: 600, noNaN: true }),
      ratio: fc.double({ min: 0.05, max: 0.9, noNaN: true }),
      phi: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
    });
    fc.assert(
      fc.property(arb, ({ q, t, R, ratio, phi }) => {
        const line = teeGenerator(ratio * R, phi);
        const host = xCylinder(R);
        const m = rotationFrom(q);
        const moved: OracleLine = { kind: 'line', originMm: add(rotate(m, line.originMm), t), direction: rotate(m, line.direction) };
        const movedHost: OracleCylinder = { ...host, axisPointMm: add(rotate(m, host.axisPointMm), t), axisDirection: rotate(m, host.axisDirection) };
        // 1e-11 (R + |t|): rounding in the rotated coordinates, at most a few ulp of the largest coordinate, amplified at most ~1/(1 - 0.9²) near the flanks.
        const scale = R + Math.hypot(...t);
        expectClose(sOf(moved, movedHost), sOf(line, host), 1e-11 * scale, 'rigid motion');
      }),
      { numRuns: 200 },
    );
  });
});

describe('cutGeneratorAgainstPlane against published statements', () => {
  it('gives the plane-cut ordinate (D/2) tan(c) (1 - cos phi) (REFERENCES.md, miter)', () => {
    // A pipe of 168.3 mm OD (EN 10220 DN 150, recalled) along +z, cut by a plane tilted by c about y.
    const D = 168.3;
    for (const cDeg of [5, 11.25, 22.5, 30, 45, 60]) {
      const c = (cDeg * Math.PI) / 180;
      const plane = { kind: 'plane', pointMm: [0, 0, 0], normal: [Math.sin(c), 0, Math.cos(c)] } as const;
      const phis = Array.from({ length: 16 }, (_, i) => (2 * Math.PI * i) / 16);
      const s = phis.map((phi) => {
        const cut = cutGeneratorAgainstPlane({ kind: 'line', originMm: combine([[(D / 2) * Math.cos(phi), [1, 0, 0]], [(D / 2) * Math.sin(phi), [0, 1, 0]], [-300, [0, 0, 1]]]), direction: [0, 0, 1] }, plane);
        if (cut.kind !== 'hit') throw new Error('expected a hit');
        return cut.sMm;
      });
      const ordinate = s.map((v) => v - s[0]!);
      const expected = phis.map((phi) => (D / 2) * Math.tan(c) * (1 - Math.cos(phi)));
      // 1e-12 (300 mm + D): each s is closed to a few ulp of its size (the generators start 300 mm back).
      expectClose(ordinate, expected, 1e-12 * (300 + D), `plane ordinate c = ${cDeg}°`);
    }
  });

  it('reports a miss for a line parallel to the plane', () => {
    expect(cutGeneratorAgainstPlane({ kind: 'line', originMm: [0, 0, 1], direction: [1, 0, 0] }, { kind: 'plane', pointMm: [0, 0, 0], normal: [0, 0, 1] })).toEqual({ kind: 'miss', reason: 'parallel' });
  });
});
