import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../test-support/close.js';
import { arcOfBulge, bulgeOfSweep, pointOnCircle, sweepDeg } from './arc-math.js';

describe('arc helpers', () => {
  // DXF bulge = tan(sweep / 4) (AutoCAD DXF Reference, LWPOLYLINE group 42; recalled):
  // a half circle has bulge 1, a quarter circle tan(22.5°) = sqrt(2) - 1.
  it('gives the DXF bulge of known sweeps', () => {
    expectClose(bulgeOfSweep(180), 1, 1e-15, 'half circle');
    expectClose(bulgeOfSweep(90), Math.SQRT2 - 1, 1e-15, 'quarter circle');
    expectClose(bulgeOfSweep(-90), 1 - Math.SQRT2, 1e-15, 'clockwise quarter');
  });

  it('measures sweeps counter-clockwise in (0, 360]', () => {
    expect(sweepDeg(350, 10)).toBeCloseTo(20, 12);
    expect(sweepDeg(0, 360)).toBe(360);
    expect(sweepDeg(-90, 90)).toBe(180);
  });

  // Invariant: an arc turned into a bulge and back has the same centre, radius and ends.
  it('recovers the arc behind a bulge', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: 1, max: 5000, noNaN: true }),
        fc.double({ min: -360, max: 360, noNaN: true }),
        fc.double({ min: 1, max: 359, noNaN: true }),
        fc.boolean(),
        (cx, cy, r, start, sweep, ccw) => {
          const end = start + sweep;
          const a = pointOnCircle(cx, cy, r, ccw ? start : end);
          const b = pointOnCircle(cx, cy, r, ccw ? end : start);
          const arc = arcOfBulge(a, b, bulgeOfSweep(ccw ? sweep : -sweep));
          const tol = 1e-9 * Math.max(r, 500) / Math.min(1, Math.sin((sweep * Math.PI) / 360) ** 2);
          expectClose(arc.radius, r, tol, 'radius');
          expectClose(arc.center[0], cx, tol, 'cx');
          expectClose(arc.center[1], cy, tol, 'cy');
          expectClose(sweepDeg(arc.startDeg, arc.endDeg), sweep, 1e-6, 'sweep');
        },
      ),
    );
  });
});
