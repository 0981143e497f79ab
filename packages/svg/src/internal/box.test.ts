/**
 * Arc boxes against the circle itself: the quadrant points of a circle of
 * radius r about c are c ± r on each axis (definition of a circle), and, as an
 * invariant checked by dense sampling, the box of an arc holds every point of
 * the arc and each of its four edges is touched by the arc.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { partBox } from './box.js';

const TOL_MM = 1e-9;

describe('partBox of an arc', () => {
  it('a half circle from 0° to 180° spans the top half (circle definition)', () => {
    const b = partBox({ kind: 'arc', center: [0, 0], radiusMm: 10, startDeg: 0, endDeg: 180 });
    expect(b.minX).toBeCloseTo(-10, 9);
    expect(b.maxX).toBeCloseTo(10, 9);
    expect(b.minY).toBeCloseTo(0, 9);
    expect(b.maxY).toBeCloseTo(10, 9);
  });

  it('a full circle (0° to 360°) spans centre ± radius on both axes', () => {
    const b = partBox({ kind: 'arc', center: [5, -3], radiusMm: 2, startDeg: 0, endDeg: 360 });
    expect([b.minX, b.minY, b.maxX, b.maxY].map((v) => Number(v.toFixed(9)))).toEqual([3, -5, 7, -1]);
  });

  it('an arc from 350° to 10° crosses 0°, so it reaches centre + radius in x', () => {
    const b = partBox({ kind: 'arc', center: [0, 0], radiusMm: 10, startDeg: 350, endDeg: 10 });
    expect(b.maxX).toBeCloseTo(10, 9);
    expect(b.minX).toBeCloseTo(10 * Math.cos((10 * Math.PI) / 180), 9);
    expect(b.maxY).toBeCloseTo(10 * Math.sin((10 * Math.PI) / 180), 9);
    expect(b.minY).toBeCloseTo(-10 * Math.sin((10 * Math.PI) / 180), 9);
  });

  it('holds every sampled point of any arc, and each edge is touched (invariant, 2000 samples, 1e-3 of the radius)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: 0.1, max: 1000, noNaN: true }),
        fc.double({ min: -720, max: 720, noNaN: true }),
        fc.double({ min: 0.5, max: 359.5, noNaN: true }),
        (cx, cy, r, startDeg, sweepDeg) => {
          const b = partBox({ kind: 'arc', center: [cx, cy], radiusMm: r, startDeg, endDeg: startDeg + sweepDeg });
          let minX = Infinity;
          let minY = Infinity;
          let maxX = -Infinity;
          let maxY = -Infinity;
          const n = 2000;
          for (let i = 0; i <= n; i++) {
            const a = ((startDeg + (sweepDeg * i) / n) * Math.PI) / 180;
            const x = cx + r * Math.cos(a);
            const y = cy + r * Math.sin(a);
            expect(x).toBeGreaterThanOrEqual(b.minX - TOL_MM * r);
            expect(x).toBeLessThanOrEqual(b.maxX + TOL_MM * r);
            expect(y).toBeGreaterThanOrEqual(b.minY - TOL_MM * r);
            expect(y).toBeLessThanOrEqual(b.maxY + TOL_MM * r);
            minX = Math.min(minX, x);
            minY = Math.min(minY, y);
            maxX = Math.max(maxX, x);
            maxY = Math.max(maxY, y);
          }
          // Sampling at 360/2000° misses an extreme by at most r(1 - cos(0.09°)) ≈ 1.3e-6 r.
          expect(Math.abs(minX - b.minX)).toBeLessThan(1e-3 * r);
          expect(Math.abs(maxX - b.maxX)).toBeLessThan(1e-3 * r);
          expect(Math.abs(minY - b.minY)).toBeLessThan(1e-3 * r);
          expect(Math.abs(maxY - b.maxY)).toBeLessThan(1e-3 * r);
        },
      ),
      { numRuns: 200 },
    );
  });
});
