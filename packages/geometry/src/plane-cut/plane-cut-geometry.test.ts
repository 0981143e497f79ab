import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectGirthError } from '@girth/pipes/test-support';
import { hitGenerator } from '../generators.js';
import { dot, sub } from '../vec3.js';
import { planeCutGeometry } from './plane-cut-geometry.js';
import { expectClose, stationPhis } from './test-support/expect-close.js';

const NPS6_STD = { odMm: 6.625 * 25.4, wallMm: 0.28 * 25.4, label: 'NPS 6 STD', npsIn: 6 }; // ASME B36.10M, recalled (REFERENCES.md)

function cutbacks(g: ReturnType<typeof planeCutGeometry>, phis: readonly number[]): number[] {
  const axial = phis.map((phi) => {
    const hit = hitGenerator(g.bundle, g.host, phi);
    if (!hit) throw new Error(`no hit at ${phi}`);
    return hit.axialMm;
  });
  const longest = Math.max(...axial);
  return axial.map((a) => longest - a);
}

describe('planeCutGeometry', () => {
  it('cuts the OD to the plane-cut ordinate at every one of 16 stations', () => {
    // REFERENCES.md, "Geometry with published statements": the ordinate of a plane cut is
    // (D/2) tan(c) (1 − cos psi), psi measured from the long point. Our phi is 0 at the heel,
    // so psi = phi − 180° and cutback(phi) = (D/2) tan(c) (1 + cos phi). c = 90° − angle.
    const g = planeCutGeometry({ pipe: NPS6_STD, angleDeg: 60 });
    const d = NPS6_STD.odMm;
    const c = (30 * Math.PI) / 180;
    const phis = stationPhis(16);
    const got = cutbacks(g, phis);
    phis.forEach((phi, i) =>
      expectClose(got[i] as number, (d / 2) * Math.tan(c) * (1 - Math.cos(phi - Math.PI)), 1e-9 * d, `cutback at station ${i + 1}`),
    );
    expect(g.cutAngleDeg).toBe(30);
  });

  it('holds the ordinate formula for any angle, OD and fit surface (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 90, noNaN: true }),
        fc.double({ min: 10, max: 2000, noNaN: true }),
        fc.double({ min: 0.01, max: 0.45, noNaN: true }),
        fc.constantFrom('od' as const, 'id' as const),
        fc.double({ min: 0, max: 20, noNaN: true }),
        (angleDeg, odMm, wallFrac, fitSurface, gapMm) => {
          const g = planeCutGeometry({ pipe: { odMm, wallMm: wallFrac * odMm }, angleDeg, fitSurface, gapMm });
          const r = fitSurface === 'od' ? odMm / 2 : odMm / 2 - wallFrac * odMm;
          const cot = 1 / Math.tan((angleDeg * Math.PI) / 180);
          const phis = stationPhis(32);
          const got = cutbacks(g, phis);
          // REFERENCES.md ordinate, as above; scale the tolerance with the longest cutback.
          const tol = 1e-9 * odMm * Math.max(1, cot);
          phis.forEach((phi, i) => expectClose(got[i] as number, r * cot * (1 + Math.cos(phi)), tol, `cutback phi=${phi}`));
          // Invariants: cutback >= 0, zero at the long point (phi = 180°), largest at the heel.
          expect(Math.min(...got)).toBeGreaterThanOrEqual(0);
          expectClose(got[16] as number, 0, tol, 'cutback at the long point');
          expect(got[0]).toBe(Math.max(...got));
        },
      ),
      { numRuns: 200 },
    );
  });

  it('leaves the root gap square to the plane and sets the cut back by gap / sin(angle) (invariant)', () => {
    const g = planeCutGeometry({ pipe: NPS6_STD, angleDeg: 40, gapMm: 3 });
    for (const phi of stationPhis(16)) {
      const hit = hitGenerator(g.bundle, g.host, phi);
      if (!hit) throw new Error('miss');
      // Distance from the plane, on the pipe's side (the normal points toward the pipe).
      expectClose(dot(sub(hit.point, g.plane.point), g.plane.normal), 3, 1e-12, `gap at phi=${phi}`);
    }
    expectClose(g.gapSetbackMm, 3 / Math.sin((40 * Math.PI) / 180), 1e-12, 'setback');
  });

  it('makes a square cut at 90° (every cutback zero)', () => {
    const g = planeCutGeometry({ pipe: NPS6_STD, angleDeg: 90 });
    for (const cb of cutbacks(g, stationPhis(16))) expectClose(cb, 0, 1e-12, 'square cut');
    expect(g.warnings).toEqual([]);
  });

  it('warns below 15° (feather edge)', () => {
    expect(planeCutGeometry({ pipe: NPS6_STD, angleDeg: 10 }).warnings.map((w) => w.code)).toEqual(['SHALLOW_PLANE_CUT']);
    expect(planeCutGeometry({ pipe: NPS6_STD, angleDeg: 15 }).warnings).toEqual([]);
  });

  it('rejects bad input with typed errors', () => {
    const pipe = NPS6_STD;
    expectGirthError(() => planeCutGeometry({ pipe, angleDeg: 0 }), 'OUT_OF_RANGE', 'angleDeg');
    expectGirthError(() => planeCutGeometry({ pipe, angleDeg: 90.001 }), 'OUT_OF_RANGE', 'angleDeg');
    expectGirthError(() => planeCutGeometry({ pipe, angleDeg: -30 }), 'OUT_OF_RANGE', 'angleDeg');
    expectGirthError(() => planeCutGeometry({ pipe, angleDeg: Number.NaN }), 'NOT_A_NUMBER', 'angleDeg');
    expectGirthError(() => planeCutGeometry({ pipe, angleDeg: Number.POSITIVE_INFINITY }), 'NOT_FINITE', 'angleDeg');
    expectGirthError(() => planeCutGeometry({ pipe, angleDeg: 45, gapMm: -1 }), 'NEGATIVE', 'gapMm');
    expectGirthError(() => planeCutGeometry({ pipe, angleDeg: 45, gapMm: Number.NaN }), 'NOT_A_NUMBER', 'gapMm');
    expectGirthError(() => planeCutGeometry({ pipe, angleDeg: 45, fitSurface: 'bore' as never }), 'BAD_CHOICE', 'fitSurface');
    expectGirthError(() => planeCutGeometry({ pipe: { odMm: 100, wallMm: 60 }, angleDeg: 45 }), 'WALL_TOO_THICK', 'pipe.wallMm');
  });
});
