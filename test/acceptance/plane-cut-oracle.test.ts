/**
 * The library's plane cut (`layoutPlaneCut`) checked against the independent
 * test oracle (test/oracle/plane-cut-oracle.ts: the fit surface's generators
 * cut by the plane by bisection on the signed distance, the long point found
 * by search, no closed form, written from the stated conventions without
 * reading the library), and against the published ordinate
 * (D/2) tan(c) (1 - cos psi) (REFERENCES.md, miter).
 *
 * Tolerance: 1e-9 x OD on every length. The oracle's bisection closes each
 * cut to adjacent doubles, and the cut of a generator by a plane at angle
 * A >= 5° amplifies the rounding of the signed distance by at most
 * 1 / sin 5° = 11.5: the oracle is good to ~1e-14 of the cutbacks, which
 * reach OD x cot 5° = 11.4 OD, so ~1e-13 OD at worst. 1e-9 OD (0.0012 mm on a
 * 48 in pipe) is four orders above that noise and five below anything a fitter
 * can mark: a failure is a disagreement of geometry or convention, not
 * rounding.
 *
 * Pipe ODs: ASME B36.10M NPS 1/2 to 48, recalled (REFERENCES.md; from NPS 14 up
 * the OD equals the NPS). Walls 2..40 mm (at most 30 % of the OD).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { layoutPlaneCut, type PlaneCutLayout } from '@girth/unroll';
import {
  exactPlaneCutStations,
  planeCutAxisCutbackMm,
  planeCutCutbackMm,
  planeCutFitRadiusMm,
  planeCutGapSetbackMm,
  planeCutLongPoint,
  type OraclePlaneCutSpec,
} from '../oracle/plane-cut-oracle.js';
import { expectClose } from '../support/expect-close.js';
import { cutPolylinePoints, stationColumn, templateById } from '../support/template-access.js';

const IN = 25.4;
/** ASME B36.10M outside diameters, inches, NPS 1/2 .. 48 (recalled; REFERENCES.md). */
const NPS_OD_IN = [0.84, 1.05, 1.315, 1.66, 1.9, 2.375, 2.875, 3.5, 4, 4.5, 5.563, 6.625, 8.625, 10.75, 12.75, 14, 16, 18, 20, 22, 24, 30, 36, 42, 48] as const;
const REL_TOL = 1e-9;
const deg = (d: number): number => (d * Math.PI) / 180;

interface PlaneCutCase {
  readonly spec: OraclePlaneCutSpec & { readonly gapMm: number; readonly fitSurface: 'od' | 'id' };
  readonly stations: number;
}

const wallMm = (odMm: number, frac: number): number => 2 + frac * (Math.min(40, 0.3 * odMm) - 2);

/** Plane cuts over NPS 1/2..48, plane angles 5..90°, root gaps 0..6 mm, both fit surfaces, 8/16/32 stations. */
const planeCutCase: fc.Arbitrary<PlaneCutCase> = fc
  .record({
    odIndex: fc.integer({ min: 0, max: NPS_OD_IN.length - 1 }),
    wallFrac: fc.double({ min: 0, max: 1, noNaN: true }),
    angleDeg: fc.oneof(fc.constant(90), fc.constant(45), fc.constant(5), fc.double({ min: 5, max: 90, noNaN: true })),
    gapMm: fc.oneof(fc.constant(0), fc.constant(6), fc.double({ min: 0, max: 6, noNaN: true })),
    fitSurface: fc.constantFrom('od' as const, 'id' as const),
    stations: fc.constantFrom(8, 16, 32),
  })
  .map(({ odIndex, wallFrac, angleDeg, gapMm, fitSurface, stations }) => {
    const odMm = NPS_OD_IN[odIndex]! * IN;
    return { spec: { pipe: { odMm, wallMm: wallMm(odMm, wallFrac) }, angleDeg, gapMm, fitSurface }, stations };
  });

const describeCase = (c: PlaneCutCase): string => JSON.stringify({ ...c.spec, stations: c.stations });
const layout = (c: PlaneCutCase): PlaneCutLayout => layoutPlaneCut(c.spec, { stations: c.stations });

describe('layoutPlaneCut against the oracle (fast-check sweep)', () => {
  it('one wrap template on the OD: id, kind, stretch-out pi x OD (common practice), station numbers and angles 360 (n-1)/N (DESIGN.md), square line at y = 0', () => {
    fc.assert(
      fc.property(planeCutCase, (c) => {
        const result = layout(c);
        expect(result.kind).toBe('plane-cut');
        expect(result.templates).toHaveLength(1);
        const t = templateById(result, 'plane-cut');
        expect(t.kind).toBe('wrap');
        if (t.kind !== 'wrap') return;
        const tol = REL_TOL * c.spec.pipe.odMm;
        expectClose(t.stretchOutMm ?? Number.NaN, Math.PI * c.spec.pipe.odMm, tol, `stretch-out ${describeCase(c)}`);
        expectClose(t.wrapOdMm ?? Number.NaN, c.spec.pipe.odMm, tol, `wrap OD ${describeCase(c)}`);
        expect(t.stations.map((s) => s.n)).toEqual(Array.from({ length: c.stations }, (_, i) => i + 1));
        expectClose(t.stations.map((s) => s.angleDeg), t.stations.map((s) => (360 * (s.n - 1)) / c.stations), 1e-9, `station angles ${describeCase(c)}`);
        const sq = t.squareLine;
        expect(sq, 'square line').toBeDefined();
        expectClose([sq!.from[1], sq!.to[1]], [0, 0], tol, `square line y ${describeCase(c)}`);
      }),
      { numRuns: 300 },
    );
  });

  it('every station: girth (OD/2) phi and cutback from the oracle long point, within 1e-9 x OD', () => {
    fc.assert(
      fc.property(planeCutCase, (c) => {
        const t = templateById(layout(c), 'plane-cut');
        const exact = exactPlaneCutStations(c.spec, c.stations);
        const tol = REL_TOL * c.spec.pipe.odMm;
        expectClose(stationColumn(t, 'girth'), exact.map((s) => s.girthMm), tol, `girth ${describeCase(c)}`);
        expectClose(stationColumn(t, 'cutback'), exact.map((s) => s.cutbackMm), tol, `cutback ${describeCase(c)}`);
      }),
      { numRuns: 300 },
    );
  });

  it('every station: the published ordinate (D/2) tan(c) (1 - cos psi), psi from the long point, D the fit surface, c = 90° - angle (REFERENCES.md, miter), within 1e-9 x OD', () => {
    fc.assert(
      fc.property(planeCutCase, (c) => {
        const t = templateById(layout(c), 'plane-cut');
        const r = planeCutFitRadiusMm(c.spec); // D/2 of the surface the plane cuts (OD, or ID for fit 'id')
        const tanC = Math.tan(deg(90 - c.spec.angleDeg));
        // Station 1 is the heel (phi = 0), the long point at phi = 180°: psi = phi - 180°, 1 - cos psi = 1 + cos phi.
        const published = t.stations.map((s) => r * tanC * (1 - Math.cos(deg(s.angleDeg - 180))));
        // The root gap moves the whole cut along the axis and leaves the ordinates unchanged.
        expectClose(stationColumn(t, 'cutback'), published, REL_TOL * c.spec.pipe.odMm, `published ordinate ${describeCase(c)}`);
      }),
      { numRuns: 300 },
    );
  });

  it('every cut-polyline point (girth, cutback) lies on the oracle cut; the line spans the whole girth and never crosses the square line, within 1e-9 x OD', () => {
    fc.assert(
      fc.property(planeCutCase, (c) => {
        const t = templateById(layout(c), 'plane-cut');
        const tol = REL_TOL * c.spec.pipe.odMm;
        const wrapR = c.spec.pipe.odMm / 2;
        const lp = planeCutLongPoint(c.spec);
        const pts = cutPolylinePoints(t);
        expectClose(pts.map(([, y]) => y), pts.map(([x]) => planeCutCutbackMm(c.spec, x / wrapR, lp)), tol, `cut polyline ${describeCase(c)}`);
        const xs = pts.map(([x]) => x);
        expect(Math.min(...xs), `polyline starts at girth 0 ${describeCase(c)}`).toBeLessThanOrEqual(tol);
        expect(Math.max(...xs), `polyline reaches the stretch-out ${describeCase(c)}`).toBeGreaterThanOrEqual(Math.PI * c.spec.pipe.odMm - tol);
        for (const [x, y] of pts) expect(y, `point (${x}, ${y}) below the square line ${describeCase(c)}`).toBeGreaterThanOrEqual(-tol);
      }),
      { numRuns: 150 },
    );
  });

  it('echoes the cut: cut angle 90° - angle, the axis cutback and the gap setback (gap square to the plane) equal the oracle, within 1e-9 x OD', () => {
    fc.assert(
      fc.property(planeCutCase, (c) => {
        const result = layout(c);
        const tol = REL_TOL * c.spec.pipe.odMm;
        expectClose(result.cutAngleDeg, 90 - c.spec.angleDeg, 1e-9, `cut angle ${describeCase(c)}`);
        expect(result.fitSurface).toBe(c.spec.fitSurface);
        expect(result.stations).toBe(c.stations);
        expectClose(result.centerCutbackMm, planeCutAxisCutbackMm(c.spec), tol, `axis cutback ${describeCase(c)}`);
        expectClose(result.gapSetbackMm, planeCutGapSetbackMm(c.spec), tol, `gap setback ${describeCase(c)}`);
      }),
      { numRuns: 300 },
    );
  });
});

describe('layoutPlaneCut: worked values and refusals', () => {
  it('without options: 16 stations of 22.5° (common practice; REFERENCES.md, M. Rose, Layout Procedures for Metals) agreeing with the oracle', () => {
    // ASME B36.10M NPS 6 STD, recalled (REFERENCES.md): OD 6.625 in, wall .280 in.
    const spec = { pipe: { odMm: 6.625 * IN, wallMm: 0.28 * IN }, angleDeg: 60 };
    const t = templateById(layoutPlaneCut(spec), 'plane-cut');
    expectClose(t.stations.map((s) => s.angleDeg), Array.from({ length: 16 }, (_, i) => 22.5 * i), 1e-9, 'default stations');
    expectClose(stationColumn(t, 'cutback'), exactPlaneCutStations(spec, 16).map((s) => s.cutbackMm), REL_TOL * spec.pipe.odMm, 'default cutbacks');
    // The heel of a cut 30° from square stands OD x tan 30° back from the long point (REFERENCES.md ordinate at psi = 180°).
    expectClose(stationColumn(t, 'cutback')[0]!, 6.625 * IN * Math.tan(deg(30)), REL_TOL * spec.pipe.odMm, 'heel ordinate');
  });

  it('refuses an angle outside (0, 90] with a typed OUT_OF_RANGE error naming the field (the oracle has no cut at 0°: the plane holds the generators)', () => {
    const pipe = { odMm: 168.3, wallMm: 7.11 };
    for (const angleDeg of [0, -10, 90.5, 180]) {
      let caught: unknown;
      try {
        layoutPlaneCut({ pipe, angleDeg });
      } catch (e) {
        caught = e;
      }
      expect(isGirthError(caught), `angle ${angleDeg}`).toBe(true);
      expect(caught).toMatchObject({ code: 'OUT_OF_RANGE', field: 'angleDeg' });
    }
    expect(() => planeCutLongPoint({ pipe, angleDeg: 0 })).toThrow(/parallel/);
  });
});
