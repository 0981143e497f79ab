import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../support/expect-close.js';
import { maximiseAroundGirth } from './girth-extreme.js';

describe('maximiseAroundGirth', () => {
  it('finds the maximum of a + b cos(phi - p0) at p0 with value a + |b| (invariant of the cosine)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e3, max: 1e3, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true, maxExcluded: true }),
        (a, b, p0) => {
          const best = maximiseAroundGirth((phi) => a + b * Math.cos(phi - p0));
          // Value: within a few ulp of a + b (the refinement leaves b × 1e-22 of curvature error).
          expectClose(best.value, a + b, 1e-12 * (Math.abs(a) + b), 'maximum value');
          // Position: a flat top pins phi only to ~sqrt(2 ulp(a + b) / b) (the value stops changing there); allow 10 times that.
          const d = Math.abs(best.phiRad - p0);
          expect(Math.min(d, 2 * Math.PI - d)).toBeLessThan(10 * Math.sqrt((2 * Number.EPSILON * (Math.abs(a) + b)) / b));
          expect(best.phiRad).toBeGreaterThanOrEqual(0);
          expect(best.phiRad).toBeLessThan(2 * Math.PI);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('picks the higher of two bumps and refuses a non-finite value or a bad grid', () => {
    const f = (phi: number): number => Math.cos(2 * phi) + 0.1 * Math.cos(phi);
    expectClose(maximiseAroundGirth(f).value, 1.1, 1e-14, 'two bumps');
    expect(() => maximiseAroundGirth(() => Number.NaN)).toThrow(/f\(0\)/);
    expect(() => maximiseAroundGirth(f, { gridSize: 4 })).toThrow(/gridSize/);
  });
});
