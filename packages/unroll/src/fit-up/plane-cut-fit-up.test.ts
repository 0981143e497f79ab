import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../internal/test-support/expect-close.js';
import { planeCutFitUp } from './plane-cut-fit-up.js';
import { planeCutArb } from './test-support/joints.js';
import { codeOf } from './test-support/code-of.js';

const DEG = Math.PI / 180;

describe('planeCutFitUp', () => {
  it('puts the centreline (D/2) tan(c) from either square line and checks the angle to the plane', () => {
    // REFERENCES.md: the ordinate of a plane cut is (D/2) tan(c)(1 − cos phi), c = 90° − angle; the axis sits halfway (phi = 90°).
    fc.assert(
      fc.property(planeCutArb, (spec) => {
        const fit = planeCutFitUp(spec, { runMm: 250 });
        const D = spec.pipe.odMm;
        const half = (D / 2) * Math.tan((90 - spec.angleDeg) * DEG);
        const tol = 1e-9 * D * (1 + Math.tan((90 - spec.angleDeg) * DEG));
        expectClose([fit.centreFromLongPointMm, fit.centreFromShortPointMm], [half, half], tol, 'centreline from each square line, mm');
        expectClose(fit.cutDepths[0]!.fullDepthMm, 2 * half, tol, 'full depth D tan(c), mm');
        expect(fit.angleCheck.angleDeg).toBe(spec.angleDeg);
        // Within a degree of square, tan A is too steep for a relative check (rounding of the degree-to-radian step alone is
        // amplified by tan A); angleCheck's own test covers the identity to 179.5°.
        if (spec.angleDeg < 89) expectClose(fit.angleCheck.riseMm! / 250, Math.tan(spec.angleDeg * DEG), 1e-9 * Math.tan(spec.angleDeg * DEG), 'rise / run = tan A (1e-9 relative)');
        else if (spec.angleDeg === 90) expect(fit.angleCheck.riseMm).toBeUndefined();
      }),
      { numRuns: 100 },
    );
  });

  it('rejects bad check lengths naming the option', () => {
    const ok = { pipe: { odMm: 168.3, wallMm: 7.11 }, angleDeg: 60 };
    expect(codeOf(() => planeCutFitUp(ok, { runMm: 0 }))).toBe('NEGATIVE:runMm');
    expect(codeOf(() => planeCutFitUp(ok, { arcUnitMm: -25.4 }))).toBe('NEGATIVE:arcUnitMm');
    expect(codeOf(() => planeCutFitUp(ok))).toBeUndefined();
  });
});
