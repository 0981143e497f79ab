/**
 * The library's branch layout checked against the independent test oracle
 * (test/oracle: bisection on the signed distance to each surface, no closed
 * form, written from the stated conventions without reading the library).
 *
 * Tolerance: 1e-9 x header OD on every length. Both sides are double-precision
 * evaluations of well-conditioned quantities: the sweep keeps every generator
 * at least 1e-4 R inside the header's silhouette, so the cut point's
 * sensitivity to rounding is at most ~R/z_min / sin A <= ~1e3 ulp of R — about
 * 1e-13 R. 1e-9 OD (0.0004 mm on a 48 in header) is far above that noise and
 * still 10^4 below anything a fitter can mark, so any failure is a real
 * disagreement of geometry or convention, not rounding.
 *
 * Pipe ODs: ASME B36.10M NPS 1/2 to 48, recalled (REFERENCES.md; from NPS 14 up
 * the OD equals the NPS). Walls 2..40 mm (limited to 30 % of the OD).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { layoutBranch } from '@girth/unroll';
import {
  branchCutS,
  branchRadii,
  exactBranchStations,
  exactHoleStations,
  exactLongPoint,
  holeContourDistanceMm,
  type OracleBranchSpec,
} from '../oracle/index.js';
import { expectClose } from '../support/expect-close.js';
import { cutPolylinePoints, stationColumn, templateById } from '../support/template-access.js';

const IN = 25.4;
/** ASME B36.10M outside diameters, inches, NPS 1/2 .. 48 (recalled; REFERENCES.md). */
const NPS_OD_IN = [0.84, 1.05, 1.315, 1.66, 1.9, 2.375, 2.875, 3.5, 4, 4.5, 5.563, 6.625, 8.625, 10.75, 12.75, 14, 16, 18, 20, 22, 24, 30, 36, 42, 48] as const;
/** Least distance of any cut generator from the header's silhouette, as a fraction of the host radius. */
const TANGENCY_MARGIN = 1e-4;
const REL_TOL = 1e-9;

interface SweepCase {
  readonly spec: OracleBranchSpec & { readonly fit: 'set-on' | 'set-in' };
  readonly stations: number;
}

const wall = (odMm: number, frac: number): number => {
  const max = Math.min(40, 0.3 * odMm);
  return 2 + frac * (max - 2);
};

/** Joints over NPS 1/2..48, angles 5..90°, offsets up to near-tangent, both fits, root gaps 0..6 mm. */
const sweepCase: fc.Arbitrary<SweepCase> = fc
  .record({
    headerIndex: fc.integer({ min: 0, max: NPS_OD_IN.length - 1 }),
    branchPick: fc.double({ min: 0, max: 1, noNaN: true }),
    headerWall: fc.double({ min: 0, max: 1, noNaN: true }),
    branchWall: fc.double({ min: 0, max: 1, noNaN: true }),
    angleDeg: fc.oneof(fc.constant(90), fc.constant(45), fc.constant(5), fc.double({ min: 5, max: 90, noNaN: true })),
    offsetFrac: fc.oneof(fc.constant(0), fc.constant(1), fc.constant(-1), fc.double({ min: -1, max: 1, noNaN: true })),
    fit: fc.constantFrom('set-on' as const, 'set-in' as const),
    gapMm: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 6, noNaN: true })),
    stations: fc.constantFrom(16, 32, 12),
  })
  .map(({ headerIndex, branchPick, headerWall, branchWall, angleDeg, offsetFrac, fit, gapMm, stations }) => {
    const hOd = NPS_OD_IN[headerIndex]! * IN;
    const bOd = NPS_OD_IN[Math.floor(branchPick * (headerIndex + 1)) % (headerIndex + 1)]! * IN;
    const header = { odMm: hOd, wallMm: wall(hOd, headerWall) };
    const branch = { odMm: bOd, wallMm: wall(bOd, branchWall) };
    const base = { header, branch, angleDeg, fit, gapMm } as const;
    const radii = branchRadii(base);
    // Room for the offset on both surfaces that are cut: the branch cut (host radius incl. gap)
    // and the hole (header OD); the smaller decides. Keep TANGENCY_MARGIN inside it.
    const room = Math.min(radii.hostRadiusMm - radii.cutRadiusMm, radii.headerOuterRadiusMm - radii.holeRadiusMm) - TANGENCY_MARGIN * radii.hostRadiusMm;
    const offsetMm = room > 0 ? offsetFrac * room : 0;
    return { spec: { ...base, offsetMm }, stations };
  })
  .filter(({ spec }) => {
    const r = branchRadii(spec);
    return r.cutRadiusMm + Math.abs(spec.offsetMm ?? 0) <= (1 - TANGENCY_MARGIN) * r.hostRadiusMm
      && r.holeRadiusMm + Math.abs(spec.offsetMm ?? 0) <= (1 - TANGENCY_MARGIN) * r.headerOuterRadiusMm;
  });

const describeSpec = (c: SweepCase): string => JSON.stringify({ ...c.spec, stations: c.stations });

describe('layoutBranch against the oracle (fast-check sweep)', () => {
  it('station angles, girths and stretch-out follow the conventions (DESIGN.md; stretch-out = pi x OD, common practice)', () => {
    fc.assert(
      fc.property(sweepCase, (c) => {
        const result = layoutBranch(c.spec, { stations: c.stations });
        const cut = templateById(result, 'branch-cut');
        const hole = templateById(result, 'header-hole');
        const tol = REL_TOL * c.spec.header.odMm;
        for (const t of [cut, hole]) {
          expect(t.stations.map((s) => s.n)).toEqual(Array.from({ length: c.stations }, (_, i) => i + 1));
          expectClose(t.stations.map((s) => s.angleDeg), t.stations.map((s) => (360 * (s.n - 1)) / c.stations), 1e-9, `${t.id} station angles ${describeSpec(c)}`);
        }
        if (cut.kind !== 'wrap') throw new Error('the branch cut is a wrap');
        expectClose(cut.stretchOutMm, Math.PI * c.spec.branch.odMm, tol, `stretch-out ${describeSpec(c)}`);
        const wrapR = c.spec.branch.odMm / 2;
        expectClose(stationColumn(cut, 'girth'), cut.stations.map((s) => (wrapR * s.angleDeg * Math.PI) / 180), tol, `branch girth ${describeSpec(c)}`);
      }),
      { numRuns: 300 },
    );
  });

  it('without options a joint gets 16 stations of 22.5° (common practice; REFERENCES.md, M. Rose, Layout Procedures for Metals)', () => {
    const spec = { header: { odMm: 12.75 * IN, wallMm: 0.375 * IN }, branch: { odMm: 6.625 * IN, wallMm: 0.28 * IN }, angleDeg: 60 };
    const result = layoutBranch(spec);
    for (const id of ['branch-cut', 'header-hole']) {
      const t = templateById(result, id);
      expectClose(t.stations.map((s) => s.angleDeg), Array.from({ length: 16 }, (_, i) => 22.5 * i), 1e-9, `${id} default stations`);
    }
    expectClose(stationColumn(templateById(result, 'branch-cut'), 'cutback'), exactBranchStations(spec, 16).map((s) => s.cutbackMm), REL_TOL * spec.header.odMm, 'default-station cutbacks');
  });

  it('branch-cut cutbacks: differences between stations equal the oracle (independent of the reference), within 1e-9 x header OD', () => {
    fc.assert(
      fc.property(sweepCase, (c) => {
        const cut = templateById(layoutBranch(c.spec, { stations: c.stations }), 'branch-cut');
        const lib = stationColumn(cut, 'cutback');
        // s along +b grows away from the header, so cutback(i) - cutback(0) = s(i) - s(0).
        const exact = exactBranchStations(c.spec, c.stations, { phiRad: 0, sMm: branchCutS(c.spec, 0) });
        expectClose(lib.map((v) => v - lib[0]!), exact.map((s) => s.cutbackMm), REL_TOL * c.spec.header.odMm, `cutback differences ${describeSpec(c)}`);
      }),
      { numRuns: 300 },
    );
  });

  it('branch-cut cutbacks: the reference is the true long point — cutbacks equal s - min s (exact min), all >= 0, within 1e-9 x header OD', () => {
    fc.assert(
      fc.property(sweepCase, (c) => {
        const cut = templateById(layoutBranch(c.spec, { stations: c.stations }), 'branch-cut');
        const lib = stationColumn(cut, 'cutback');
        const tol = REL_TOL * c.spec.header.odMm;
        const exact = exactBranchStations(c.spec, c.stations, exactLongPoint(c.spec));
        expectClose(lib, exact.map((s) => s.cutbackMm), tol, `absolute cutback ${describeSpec(c)}`);
        for (const [x, y] of cutPolylinePoints(cut)) expect(y, `contour point (${x}, ${y}) below the square line ${describeSpec(c)}`).toBeGreaterThanOrEqual(-tol);
      }),
      { numRuns: 300 },
    );
  });

  it('branch-cut contour: every polyline point (girth, cutback) lies on the exact cut, within 1e-9 x header OD', () => {
    fc.assert(
      fc.property(sweepCase, (c) => {
        const cut = templateById(layoutBranch(c.spec, { stations: c.stations }), 'branch-cut');
        const wrapR = c.spec.branch.odMm / 2;
        const lp = exactLongPoint(c.spec);
        const pts = cutPolylinePoints(cut);
        const exact = pts.map(([x]) => branchCutS(c.spec, x / wrapR) - lp.sMm);
        expectClose(pts.map(([, y]) => y), exact, REL_TOL * c.spec.header.odMm, `cut contour ${describeSpec(c)}`);
      }),
      { numRuns: 100 },
    );
  });

  it('header-hole stations: girth around the header OD from its top line and axial position equal the oracle, within 1e-9 x header OD', () => {
    fc.assert(
      fc.property(sweepCase, (c) => {
        const hole = templateById(layoutBranch(c.spec, { stations: c.stations }), 'header-hole');
        const exact = exactHoleStations(c.spec, c.stations);
        const tol = REL_TOL * c.spec.header.odMm;
        expectClose(stationColumn(hole, 'girth'), exact.map((s) => s.girthMm), tol, `hole girth ${describeSpec(c)}`);
        expectClose(stationColumn(hole, 'axial'), exact.map((s) => s.axialMm), tol, `hole axial ${describeSpec(c)}`);
      }),
      { numRuns: 300 },
    );
  });

  it('header-hole contour: every polyline point lies on the exact hole curve, within 1e-9 x header OD', () => {
    fc.assert(
      fc.property(sweepCase, (c) => {
        const hole = templateById(layoutBranch(c.spec, { stations: c.stations }), 'header-hole');
        const tol = REL_TOL * c.spec.header.odMm;
        const pts = cutPolylinePoints(hole);
        const d = pts.map(([g, a]) => holeContourDistanceMm(c.spec, g, a));
        expectClose(d, d.map(() => 0), tol, `hole contour distance ${describeSpec(c)}`);
      }),
      { numRuns: 100 },
    );
  });
});
