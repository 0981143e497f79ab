import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { arcBox } from './box.js';

/** Box of many points along the arc: the brute-force oracle (a dense sample only ever under-reaches). */
function sampledBox(c: readonly [number, number], r: number, startDeg: number, sweepDeg: number) {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  const n = 20000;
  for (let i = 0; i <= n; i++) {
    const a = ((startDeg + (sweepDeg * i) / n) * Math.PI) / 180;
    const x = c[0] + r * Math.cos(a);
    const y = c[1] + r * Math.sin(a);
    minX = Math.min(minX, x);
    minY = Math.min(minY, y);
    maxX = Math.max(maxX, x);
    maxY = Math.max(maxY, y);
  }
  return { minX, minY, maxX, maxY };
}

describe('arcBox', () => {
  test('a half circle over the top reaches the top quadrant point (invariant)', () => {
    expect(arcBox([0, 0], 10, 0, 180)).toEqual({ minX: -10, minY: expect.closeTo(0, 12), maxX: 10, maxY: 10 });
  });

  test('an arc across 0° (350° to 10°) reaches +x', () => {
    const b = arcBox([5, 5], 2, 350, 10);
    expect(b.maxX).toBe(7);
    expect(b.minX).toBeCloseTo(5 + 2 * Math.cos((10 * Math.PI) / 180), 12);
  });

  test('a whole circle is its square', () => {
    expect(arcBox([1, 2], 3, 0, 360)).toEqual({ minX: -2, minY: -1, maxX: 4, maxY: 5 });
  });

  test('agrees with a dense sample of the arc to within the sampling error (r (1 - cos(step/2)))', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: 0.1, max: 1000, noNaN: true }),
        fc.double({ min: -720, max: 720, noNaN: true }),
        fc.double({ min: 0.5, max: 359.5, noNaN: true }),
        (cx, cy, r, start, sweep) => {
          const got = arcBox([cx, cy], r, start, start + sweep);
          const want = sampledBox([cx, cy], r, start, sweep);
          // Sampling every sweep/20000 degrees misses an extreme by at most r (1 - cos(step / 2)) < 2e-8 r.
          const tol = 2e-8 * r + 1e-9;
          expect(Math.abs(got.minX - want.minX)).toBeLessThanOrEqual(tol);
          expect(Math.abs(got.maxX - want.maxX)).toBeLessThanOrEqual(tol);
          expect(Math.abs(got.minY - want.minY)).toBeLessThanOrEqual(tol);
          expect(Math.abs(got.maxY - want.maxY)).toBeLessThanOrEqual(tol);
        },
      ),
      { numRuns: 200 },
    );
  });
});
