import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../support/expect-close.js';
import {
  exactPlaneCutStations,
  planeCutAxisCutbackMm,
  planeCutFitRadiusMm,
  planeCutFrame,
  planeCutGapSetbackMm,
  planeCutLongPoint,
  type OraclePlaneCutSpec,
} from './plane-cut-oracle.js';
import { dot, norm } from './vec3.js';

const IN = 25.4;
// ASME B36.10M, recalled (REFERENCES.md): NPS 6 OD 6.625 in, STD wall .280 in.
const NPS6_STD = { odMm: 6.625 * IN, wallMm: 0.28 * IN };
const deg = (d: number): number => (d * Math.PI) / 180;

describe('plane-cut oracle against the published ordinate (REFERENCES.md, miter: (D/2) tan(cut) (1 - cos psi))', () => {
  it('ordinates of an NPS 6 STD cut at 60° to the plane (cut 30° from square), OD and ID', () => {
    for (const fitSurface of ['od', 'id'] as const) {
      const spec: OraclePlaneCutSpec = { pipe: NPS6_STD, angleDeg: 60, fitSurface };
      const r = planeCutFitRadiusMm(spec);
      const st = exactPlaneCutStations(spec, 16);
      // psi from the long point = phi - 180°, so 1 - cos psi = 1 + cos phi.
      const expected = st.map((s) => r * Math.tan(deg(30)) * (1 + Math.cos(s.phiRad)));
      // 1e-12 OD: cutbacks below 0.6 OD, plane at 60° to the generators; both sides a few ulp.
      expectClose(st.map((s) => s.cutbackMm), expected, 1e-12 * NPS6_STD.odMm, `ordinates ${fitSurface}`);
    }
  });

  it('a square cut (90°) has every ordinate zero and the long point anywhere', () => {
    const st = exactPlaneCutStations({ pipe: NPS6_STD, angleDeg: 90, gapMm: 2 }, 8);
    expectClose(st.map((s) => s.cutbackMm), st.map(() => 0), 1e-12 * NPS6_STD.odMm, 'square cut');
  });

  it('over a sweep: ordinates, the axis cutback r tan c, and the gap setback g / sin A (the gap is square to the plane)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 21.3, max: 1219.2, noNaN: true }),
        fc.double({ min: 5, max: 90, noNaN: true }),
        fc.double({ min: 0, max: 6, noNaN: true }),
        fc.constantFrom('od' as const, 'id' as const),
        (odMm, angleDeg, gapMm, fitSurface) => {
          const spec: OraclePlaneCutSpec = { pipe: { odMm, wallMm: 0.1 * odMm }, angleDeg, gapMm, fitSurface };
          const r = planeCutFitRadiusMm(spec);
          const tanC = Math.tan(deg(90 - angleDeg));
          const lp = planeCutLongPoint(spec);
          const st = exactPlaneCutStations(spec, 16, lp);
          // 1e-12 OD (1 + tan c): the cutbacks grow with tan c (to 11.4 at 5°), rounding with them.
          const tol = 1e-12 * odMm * (1 + tanC);
          expectClose(st.map((s) => s.cutbackMm), st.map((s) => r * tanC * (1 + Math.cos(s.phiRad))), tol, 'ordinates');
          expectClose(planeCutAxisCutbackMm(spec, lp), r * tanC, tol, 'axis cutback');
          expectClose(planeCutGapSetbackMm(spec), gapMm / Math.sin(deg(angleDeg)), 1e-12 * odMm, 'gap setback');
        },
      ),
      { numRuns: 100 },
    );
  });

  it('frames the plane at the stated angle to the axis, its normal toward the pipe, the host moved by the gap', () => {
    const f = planeCutFrame({ pipe: NPS6_STD, angleDeg: 35, gapMm: 3 });
    expectClose(Math.asin(Math.abs(dot(f.axis, f.plane.normal))), deg(35), 1e-15, 'axis-to-plane angle');
    expect(dot(f.axis, f.plane.normal)).toBeLessThan(0);
    expectClose(norm(f.plane.normal), 1, 1e-15, 'unit normal');
    expectClose(dot(f.host.pointMm, f.plane.normal), 3, 1e-15, 'host moved by the gap along the normal');
  });
});
