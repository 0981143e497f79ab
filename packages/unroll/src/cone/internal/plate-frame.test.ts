import { describe, it } from 'vitest';
import fc from 'fast-check';
import type { Point2 } from '../../types.js';
import { arcExtremePoints, boundsOfPoints, movePoint, uprightRotation } from './plate-frame.js';
import { expectNear } from '../test-support/cone-test-support.js';

describe('plate frame', () => {
  it('the extreme points of an arc bound it as tightly as a dense sampling does (invariant)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -720, max: 720, noNaN: true }),
        fc.double({ min: 0.01, max: 359.9, noNaN: true }),
        fc.double({ min: 0.1, max: 1000, noNaN: true }),
        (start, sweep, r) => {
          const b = boundsOfPoints(arcExtremePoints([3, -4], r, start, start + sweep));
          const pts: Point2[] = [];
          for (let i = 0; i <= 4000; i++) {
            const t = ((start + (sweep * i) / 4000) * Math.PI) / 180;
            pts.push([3 + r * Math.cos(t), -4 + r * Math.sin(t)]);
          }
          const s = boundsOfPoints(pts);
          const tol = r * 1e-6 + 1e-9;
          expectNear(b.minX, s.minX, tol, 'minX');
          expectNear(b.maxX, s.maxX, tol, 'maxX');
          expectNear(b.minY, s.minY, tol, 'minY');
          expectNear(b.maxY, s.maxY, tol, 'maxY');
        },
      ),
    );
  });

  it('turns any direction to point straight up', () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true }), (x, y) => {
        if (Math.hypot(x, y) < 1e-3) return;
        const m = uprightRotation([1, 1], [1 + x, 1 + y]);
        const a = movePoint([1, 1], m);
        const b = movePoint([1 + x, 1 + y], m);
        expectNear(b[0] - a[0], 0, 1e-9, 'dx');
        expectNear(b[1] - a[1], Math.hypot(x, y), 1e-9, 'dy');
      }),
    );
  });
});
