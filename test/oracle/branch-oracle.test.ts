import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isGirthError } from '@girth/pipes';
import { expectClose } from '../support/expect-close.js';
import {
  branchCutS,
  branchFrame,
  branchGenerator,
  branchRadii,
  exactBranchStations,
  exactHolePoint,
  exactHoleStations,
  exactLongPoint,
  holeContourDistanceMm,
  type OracleBranchSpec,
} from './branch-oracle.js';
import { pointOnLine } from './generator-cut.js';
import { dot } from './vec3.js';

const IN = 25.4;
// ASME B36.10M, recalled (REFERENCES.md): NPS 12 OD 12.750 in, STD .375 in; NPS 6 OD 6.625 in, STD .280 in.
const NPS12_STD = { odMm: 12.75 * IN, wallMm: 0.375 * IN };
const NPS6_STD = { odMm: 6.625 * IN, wallMm: 0.28 * IN };
const deg = (d: number): number => (d * Math.PI) / 180;

describe('branch oracle: a centred tee against the published saddle (MathWorld, "Cylinder-Cylinder Intersection"; REFERENCES.md)', () => {
  const tee: OracleBranchSpec = { header: NPS12_STD, branch: NPS6_STD };
  const R = NPS12_STD.odMm / 2;
  const r = NPS6_STD.odMm / 2 - NPS6_STD.wallMm; // set-on: branch ID on header OD (common practice)

  it('cutback = sqrt(R² - r² sin² phi) - sqrt(R² - r²), i.e. saddle depth at the flank minus depth at phi', () => {
    const st = exactBranchStations(tee, 16);
    const expected = st.map((s) => Math.sqrt(R * R - r * r * Math.sin(s.phiRad) ** 2) - Math.sqrt(R * R - r * r));
    // 1e-12 R: both sides are exact to a few ulp of R (r/R = 0.48, well conditioned).
    expectClose(st.map((s) => s.cutbackMm), expected, 1e-12 * R, 'tee cutback');
    expectClose(st.map((s) => s.girthMm), st.map((s) => (NPS6_STD.odMm / 2) * s.phiRad), 1e-12, 'girth on the branch OD');
  });

  it('puts the long point at a flank (phi = 90° or 270°)', () => {
    const lp = exactLongPoint(tee);
    // Near a smooth minimum the argument is found to ~sqrt(eps): 1e-6 rad.
    expect(Math.min(Math.abs(lp.phiRad - deg(90)), Math.abs(lp.phiRad - deg(270)))).toBeLessThan(1e-6);
    expectClose(lp.sMm, Math.sqrt(R * R - r * r), 1e-12 * R, 'long point s');
  });

  it('develops the hole: axial = -r cos phi, girth = R asin(r sin phi / R)', () => {
    const st = exactHoleStations(tee, 16);
    expectClose(st.map((s) => s.axialMm), st.map((s) => -r * Math.cos(s.phiRad)), 1e-12 * R, 'tee hole axial');
    expectClose(st.map((s) => s.girthMm), st.map((s) => R * Math.asin((r * Math.sin(s.phiRad)) / R)), 1e-12 * R, 'tee hole girth');
  });

  it('set-in uses branch OD on header ID for the cut and branch OD on header OD for the hole (REFERENCES.md, common practice)', () => {
    const setIn: OracleBranchSpec = { ...tee, fit: 'set-in' };
    const rIn = NPS6_STD.odMm / 2;
    const RIn = NPS12_STD.odMm / 2 - NPS12_STD.wallMm;
    const st = exactBranchStations(setIn, 16);
    expectClose(st.map((s) => s.cutbackMm), st.map((s) => Math.sqrt(RIn * RIn - rIn * rIn * Math.sin(s.phiRad) ** 2) - Math.sqrt(RIn * RIn - rIn * rIn)), 1e-12 * R, 'set-in cutback');
    const hole = exactHoleStations(setIn, 16);
    expectClose(hole.map((s) => s.axialMm), hole.map((s) => -rIn * Math.cos(s.phiRad)), 1e-12 * R, 'set-in hole axial');
  });

  it('a root gap g cuts on the cylinder R + g and leaves the hole alone (first principles from the stated convention)', () => {
    const g = 3;
    const gapped = exactBranchStations({ ...tee, gapMm: g }, 16);
    const Rg = R + g;
    expectClose(gapped.map((s) => s.cutbackMm), gapped.map((s) => Math.sqrt(Rg * Rg - r * r * Math.sin(s.phiRad) ** 2) - Math.sqrt(Rg * Rg - r * r)), 1e-12 * R, 'gapped cutback');
    expectClose(exactHoleStations({ ...tee, gapMm: g }, 16).map((s) => s.axialMm), exactHoleStations(tee, 16).map((s) => s.axialMm), 0, 'hole ignores the gap');
  });
});

describe('branch oracle: laterals and offsets (first principles)', () => {
  it('heel and toe lie in the plane of both axes and meet the header top line: s = (R ∓ r cos A) / sin A', () => {
    // The heel generator (phi = 0) is offset by r u = r (-sin A, 0, cos A) and meets z = R at s = (R - r cos A)/sin A;
    // the toe (phi = 180°) by -r u, at s = (R + r cos A)/sin A. So the toe's cutback exceeds the heel's by 2 r cot A.
    for (const A of [15, 30, 45, 60, 75]) {
      const spec: OracleBranchSpec = { header: NPS12_STD, branch: NPS6_STD, angleDeg: A };
      const R = NPS12_STD.odMm / 2;
      const r = NPS6_STD.odMm / 2 - NPS6_STD.wallMm;
      const a = deg(A);
      expectClose(branchCutS(spec, 0), (R - r * Math.cos(a)) / Math.sin(a), 1e-12 * R / Math.sin(a), `heel s, A = ${A}`);
      expectClose(branchCutS(spec, Math.PI), (R + r * Math.cos(a)) / Math.sin(a), 1e-12 * R / Math.sin(a), `toe s, A = ${A}`);
      const heel = exactHolePoint(spec, 0);
      const toe = exactHolePoint(spec, Math.PI);
      expectClose([heel.axialMm, toe.axialMm], [R / Math.tan(a) - r / Math.sin(a), R / Math.tan(a) + r / Math.sin(a)], 1e-12 * R / Math.sin(a), `hole ends, A = ${A}`);
      expectClose([heel.girthMm, toe.girthMm], [0, 0], 1e-12 * R, `hole ends on the top line, A = ${A}`);
    }
  });

  it('equal radii with crossing axes cut in two planes: (p·x)² = (p·b)² (first principles: |p|² - (p·x)² = R² = |p|² - (p·b)²; common practice: equal-size laterals and miters are plane cuts)', () => {
    // Set-in with branch OD/2 equal to header ID/2 (an invented size pair that makes the radii equal).
    const header = { odMm: 219.1, wallMm: 8.18 };
    const branch = { odMm: 219.1 - 2 * 8.18, wallMm: 6 };
    for (const A of [30, 45, 60, 90]) {
      const spec: OracleBranchSpec = { header, branch, angleDeg: A, fit: 'set-in' };
      const radii = branchRadii(spec);
      expectClose(radii.cutRadiusMm, radii.hostRadiusMm, 1e-12, 'equal radii');
      const frame = branchFrame(A, 0);
      for (let i = 0; i < 36; i++) {
        const phi = (2 * Math.PI * (i + 0.37)) / 36; // away from the tangent flanks
        const p = pointOnLine(branchGenerator(frame, radii.cutRadiusMm, phi), branchCutS(spec, phi));
        const px = p[0];
        const pb = dot(p, frame.b);
        // Conditioning near the flanks ~1/|cos phi| <= 1/0.06 here; 1e-11 R² on the squares is ample.
        expectClose(px * px, pb * pb, 1e-11 * radii.hostRadiusMm ** 2, `plane cut A = ${A}, phi = ${phi}`);
      }
    }
  });

  it('an offset keeps y constant along each generator: hole girth = R asin((e + r sin phi) / R) (first principles)', () => {
    const e = 50;
    const spec: OracleBranchSpec = { header: NPS12_STD, branch: NPS6_STD, angleDeg: 60, offsetMm: e };
    const R = NPS12_STD.odMm / 2;
    const r = NPS6_STD.odMm / 2 - NPS6_STD.wallMm;
    const st = exactHoleStations(spec, 32);
    expectClose(st.map((s) => s.girthMm), st.map((s) => R * Math.asin((e + r * Math.sin(s.phiRad)) / R)), 1e-12 * R, 'offset hole girth');
    for (const s of st) expectClose(holeContourDistanceMm(spec, s.girthMm, s.axialMm), 0, 1e-10, `hole point n = ${s.n} lies on the curve`);
    expectClose(holeContourDistanceMm(spec, st[3]!.girthMm, st[3]!.axialMm + 0.5), 0.5, 0.05, 'a point moved 0.5 mm along the header is found about 0.5 mm off');
  });

  it('refuses an offset that takes part of the branch off the header (GirthError OFFSET_MISSES)', () => {
    const R = NPS12_STD.odMm / 2;
    const r = NPS6_STD.odMm / 2 - NPS6_STD.wallMm;
    let caught: unknown;
    try {
      exactBranchStations({ header: NPS12_STD, branch: NPS6_STD, offsetMm: R - r + 1 }, 16);
    } catch (err) {
      caught = err;
    }
    expect(isGirthError(caught, 'OFFSET_MISSES')).toBe(true);
  });

  it('sweep: cutbacks are >= 0 and reach 0 at the long point; a centred branch is mirror-symmetric (invariants)', () => {
    const arb = fc.record({
      R: fc.double({ min: 20, max: 600, noNaN: true }),
      ratio: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
      offsetFrac: fc.double({ min: -0.95, max: 0.95, noNaN: true }),
      angleDeg: fc.double({ min: 5, max: 90, noNaN: true }),
    });
    fc.assert(
      fc.property(arb, ({ R, ratio, offsetFrac, angleDeg }) => {
        const rCut = ratio * R;
        const e = offsetFrac * (R - rCut);
        const spec: OracleBranchSpec = { header: { odMm: 2 * R, wallMm: 0.05 * R }, branch: { odMm: 2 * (rCut + 1), wallMm: 1 }, angleDeg, offsetMm: e };
        const lp = exactLongPoint(spec, { gridSize: 512 });
        const st = exactBranchStations(spec, 32, lp);
        const scale = R / Math.sin(deg(angleDeg));
        for (const s of st) expect(s.cutbackMm).toBeGreaterThanOrEqual(-1e-12 * scale);
        expectClose(branchCutS(spec, lp.phiRad) - lp.sMm, 0, 1e-12 * scale, 'long point is a cut');
        const centred = exactBranchStations({ ...spec, offsetMm: 0 }, 32);
        const mirrored = centred.map((_, i) => centred[(32 - i) % 32]!.cutbackMm);
        expectClose(centred.map((s) => s.cutbackMm), mirrored, 1e-11 * scale, 'mirror symmetry of a centred branch');
      }),
      { numRuns: 60 },
    );
  });
});
