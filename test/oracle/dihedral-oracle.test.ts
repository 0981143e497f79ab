/**
 * Self-tests of the dihedral oracle against closed values derived by hand
 * (REFERENCES.md, AWS D1.1 local dihedral angle, recalled): a lateral at A has
 * A at the toe and 180 − A at the heel; a tee has 90 at the crown and
 * 90 + asin(d/D) at the sides (the header's tangent turns by asin(d/D) there,
 * d and D the diameters of the surfaces that meet); a plane cut at angle a has
 * a at the heel and 180 − a opposite; two miter pieces with cut angle c meet
 * at 180 − 2c on the throat and 180 + 2c on the back. Tolerance 1e-6 degree:
 * central differences with a 1e-6 relative step are good to about 1e-9.
 */
import { describe, expect, it } from 'vitest';
import { gradientByDifferences, miterWeldPoint, oracleDihedralDeg, oracleMiterDihedralDeg, branchWeldPoint, planeCutWeldPoint } from './dihedral-oracle.js';

const TOL = 1e-6;
const header = { odMm: 323.85, wallMm: 9.525 };
const branch = { odMm: 168.275, wallMm: 7.112 };

describe('dihedral oracle', () => {
  it('differentiates a known function', () => {
    const g = gradientByDifferences((p) => p[0] * p[0] + 3 * p[1] - p[2], [2, 5, 7], 1e-5);
    expect(g[0]).toBeCloseTo(4, 8);
    expect(g[1]).toBeCloseTo(3, 8);
    expect(g[2]).toBeCloseTo(-1, 8);
  });
  it('gives A at the toe and 180 − A at the heel of a lateral', () => {
    for (const a of [30, 45, 60, 75]) {
      const spec = { header, branch, angleDeg: a };
      expect(Math.abs(oracleDihedralDeg(branchWeldPoint(spec, Math.PI)) - a)).toBeLessThan(TOL);
      expect(Math.abs(oracleDihedralDeg(branchWeldPoint(spec, 0)) - (180 - a))).toBeLessThan(TOL);
    }
  });
  it('gives 90 at the crown and 90 + asin(d/D) at the sides of a tee', () => {
    const spec = { header, branch };
    const d = branch.odMm - 2 * branch.wallMm; // set-on: branch ID on header OD
    const side = 90 + (Math.asin(d / header.odMm) * 180) / Math.PI;
    expect(Math.abs(oracleDihedralDeg(branchWeldPoint(spec, 0)) - 90)).toBeLessThan(TOL);
    expect(Math.abs(oracleDihedralDeg(branchWeldPoint(spec, Math.PI / 2)) - side)).toBeLessThan(TOL);
    expect(Math.abs(oracleDihedralDeg(branchWeldPoint(spec, (3 * Math.PI) / 2)) - side)).toBeLessThan(TOL);
  });
  it('gives the cut angle at the heel of a plane cut and its supplement opposite', () => {
    const spec = { pipe: branch, angleDeg: 50 };
    expect(Math.abs(oracleDihedralDeg(planeCutWeldPoint(spec, 0)) - 50)).toBeLessThan(TOL);
    expect(Math.abs(oracleDihedralDeg(planeCutWeldPoint(spec, Math.PI)) - 130)).toBeLessThan(TOL);
    expect(Math.abs(oracleDihedralDeg(planeCutWeldPoint(spec, Math.PI / 2)) - 90)).toBeLessThan(TOL);
  });
  it('gives 180 − 2c on the throat and 180 + 2c on the back of a miter', () => {
    const spec = { pipe: header, bendDeg: 90, welds: 3, radiusMm: 1.5 * 304.8 }; // c = 15°
    expect(Math.abs(oracleMiterDihedralDeg(spec, 0) - 150)).toBeLessThan(TOL);
    expect(Math.abs(oracleMiterDihedralDeg(spec, Math.PI) - 210)).toBeLessThan(TOL);
    expect(miterWeldPoint(spec, 0).host(miterWeldPoint(spec, 0).pointMm)).toBeCloseTo(0, 6); // the weld point lies on both pieces
  });
});
